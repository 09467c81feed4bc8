import { useEffect, useState, type ReactNode } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { Role } from '@keybed/shared';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Field } from '@/components/field';
import { Select } from '@/components/select';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { useWeek } from '../api/get-week';
import { currentWeekStart, weekStartFromText } from '../lib/week';
import type { TaskFieldProps } from './correction-form';
import { DayList } from './day-list';
import { JobTotals } from './job-totals';
import { WeekPicker } from './week-picker';
import { WeekSummary } from './week-summary';

interface TimesheetScreenProps {
  role: Role;
  /** People whose weeks a supervisor may open; undefined for technicians (their own week only). */
  technicians: readonly { id: string; name: string }[] | undefined;
  renderTaskField: (props: TaskFieldProps) => ReactNode;
}

const browserTimeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone;

function WeekSkeleton() {
  return (
    <LoadingRegion label="Loading the week">
      <Skeleton className="h-20 w-full" />
      <Skeleton className="mt-4 h-64 w-full" />
    </LoadingRegion>
  );
}

/**
 * A technician's week, Monday to Sunday in the workshop's time zone. The week and the technician
 * live in the URL, so a week can be shared or reloaded.
 */
export function TimesheetScreen({ role, technicians, renderTaskField }: TimesheetScreenProps) {
  const [params, setParams] = useSearchParams();
  // The workshop's zone arrives with the first week; until then the browser's is the best guess.
  const [timeZone, setTimeZone] = useState(browserTimeZone);
  const thisWeek = currentWeekStart(Date.now(), timeZone);
  const weekStart = weekStartFromText(params.get('weekStart')) ?? thisWeek;
  const isSupervisor = technicians !== undefined;
  const technicianId = isSupervisor ? (params.get('technicianId') ?? technicians[0]?.id) : undefined;
  const week = useWeek({ technicianId, weekStart });

  useEffect(() => {
    if (week.data && week.data.timeZone !== timeZone) setTimeZone(week.data.timeZone);
  }, [week.data, timeZone]);

  const setParam = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    next.set(key, value);
    setParams(next);
  };

  if (isSupervisor && technicians.length === 0) {
    return <EmptyState title="Nobody to show yet">Timesheets appear once technicians join the workshop.</EmptyState>;
  }
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
        {isSupervisor && (
          <Field label="Technician" className="w-64">
            {(control) => (
              <Select {...control} options={technicians.map((t) => ({ value: t.id, label: t.name }))} value={technicianId} onChange={(e) => setParam('technicianId', e.target.value)} />
            )}
          </Field>
        )}
        <WeekPicker weekStart={weekStart} thisWeek={thisWeek} onChange={(next) => setParam('weekStart', next)} />
      </div>
      {week.isPending ? (
        <WeekSkeleton />
      ) : week.isError ? (
        <ErrorState error={week.error} onRetry={() => void week.refetch()} isRetrying={week.isFetching} />
      ) : (
        <div aria-busy={week.isPlaceholderData || undefined} className="space-y-6">
          <h2 className="sr-only">{week.data.technician.name}</h2>
          <WeekSummary week={week.data} canApprove={isSupervisor} technicianId={technicianId} />
          <div className="grid gap-8 xl:grid-cols-[1fr_24rem]">
            <DayList week={week.data} canCorrect={(entry) => isSupervisor && (!entry.isLocked || role === 'owner')} renderTaskField={renderTaskField} />
            <section aria-labelledby="week-by-job" className="space-y-2">
              <h3 id="week-by-job" className="font-semibold">By job and task</h3>
              {week.data.byJob.length > 0 ? <JobTotals byJob={week.data.byJob} /> : <p className="text-graphite-600">No time this week.</p>}
            </section>
          </div>
        </div>
      )}
    </div>
  );
}
