import type { TimesheetWeek } from '@keybed/shared';
import { formatHoursMinutes } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button, buttonClasses } from '@/components/button';
import { spokenHoursMinutes } from '@/lib/duration';
import { formatDateTime } from '@/lib/format';
import { showToast } from '@/lib/toast';
import { useApproveWeek } from '../api/approve-week';
import { weekCsvHref } from '../api/get-week';

interface WeekSummaryProps {
  week: TimesheetWeek;
  canApprove: boolean;
  /** Sent with the CSV link; absent for the member's own week. */
  technicianId: string | undefined;
}

/** The week's total, whether it is approved, approving it, and the CSV download. */
export function WeekSummary({ week, canApprove, technicianId }: WeekSummaryProps) {
  const approve = useApproveWeek();
  const reviewCount = week.days.flatMap((d) => d.entries).filter((e) => e.entry.needsReview).length;
  const runningCount = week.days.flatMap((d) => d.entries).filter((e) => e.entry.endedAt === null).length;
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-x-8 gap-y-3 rounded-lg border border-graphite-300 bg-white px-4 py-3">
        <p>
          <span className="block text-sm text-graphite-600">Total</span>
          <span className="text-2xl font-bold tabular-figures" aria-label={spokenHoursMinutes(week.totalMinutes)}>
            {formatHoursMinutes(week.totalMinutes)}
          </span>
        </p>
        <p className="min-w-0 flex-1">
          <span className="block text-sm text-graphite-600">Approval</span>
          {week.approval ? (
            <span className="font-semibold">
              Approved{week.approval.by ? ` by ${week.approval.by.name}` : ''} on {formatDateTime(week.approval.at)} · locked
            </span>
          ) : (
            <span>Not approved yet</span>
          )}
        </p>
        <div className="flex flex-wrap gap-2">
          {canApprove && !week.approval && (
            <Button
              isPending={approve.isPending}
              onClick={() =>
                approve.mutate(
                  { technicianId: week.technician.id, weekStart: week.weekStart },
                  { onSuccess: () => showToast('success', `${week.technician.name}’s week is approved and locked.`) },
                )
              }
            >
              Approve the week
            </Button>
          )}
          <a href={weekCsvHref({ technicianId, weekStart: week.weekStart })} download className={buttonClasses('secondary')}>
            Download CSV
          </a>
        </div>
      </div>
      {reviewCount > 0 && (
        <Alert title={`${reviewCount} ${reviewCount === 1 ? 'entry needs' : 'entries need'} review`}>
          <p>Highlighted below: left running until the bench-day close. {canApprove ? 'Correct the end time, then approve.' : 'The foreman will correct them.'}</p>
        </Alert>
      )}
      {canApprove && !week.approval && runningCount > 0 && (
        <p className="text-sm text-graphite-600">A week with a running entry can be approved once it is clocked off.</p>
      )}
    </div>
  );
}
