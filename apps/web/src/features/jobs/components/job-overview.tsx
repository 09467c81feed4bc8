import type { JobDetail } from '@keybed/shared';
import { formatDay, isOverdue, todayKey } from '@/lib/format';
import { PRIORITY_LABELS, STATUS_LABELS } from '../lib/job-labels';

/** Status, priority, promised date, blocked reason and notes, read only (for technicians). */
export function JobOverview({ job }: { job: JobDetail }) {
  const isLate = isOverdue(job.promisedOn, todayKey());
  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-[9rem_1fr] gap-x-4 gap-y-2">
        <dt className="font-semibold text-graphite-700">Status</dt>
        <dd>{STATUS_LABELS[job.status]}</dd>
        <dt className="font-semibold text-graphite-700">Priority</dt>
        <dd>{PRIORITY_LABELS[job.priority]}</dd>
        <dt className="font-semibold text-graphite-700">Promised</dt>
        <dd className={isLate ? 'font-semibold text-damper' : undefined}>
          {job.promisedOn ? `${formatDay(job.promisedOn)}${isLate ? ' (overdue)' : ''}` : 'No date promised'}
        </dd>
        {job.isBlocked && (
          <>
            <dt className="font-semibold text-graphite-700">Blocked</dt>
            <dd className="font-semibold text-damper">{job.blockedReason}</dd>
          </>
        )}
      </dl>
      <div>
        <h3 className="font-semibold">Notes</h3>
        <p className={job.notes ? 'mt-1 whitespace-pre-line' : 'mt-1 text-graphite-600'}>{job.notes || 'No notes yet.'}</p>
      </div>
    </div>
  );
}
