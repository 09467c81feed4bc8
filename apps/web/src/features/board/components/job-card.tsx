import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { Job } from '@keybed/shared';
import { paths } from '@/config/paths';
import { cx } from '@/lib/cx';
import { formatDay, isOverdue } from '@/lib/format';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { pianoName, pianoShape } from '@/lib/piano';
import { TechnicianInitials } from './technician-initials';

export interface JobCardProps {
  job: Job;
  unit: PreferredLengthUnit;
  /** Today's date (YYYY-MM-DD) for the overdue check. */
  today: string;
  /** The drag handle, for members who may move cards. */
  handle?: ReactNode;
  /** The card's figures beside the technicians: hours for every member, the forecast margin for the owner. */
  footerExtras?: ReactNode;
  /** Lifted in a drag overlay: no link, so nothing can be focused twice. */
  isOverlay?: boolean;
  className?: string;
}

function PriorityMark({ priority }: { priority: Job['priority'] }) {
  if (priority !== 'high' && priority !== 'urgent') return null;
  return (
    <span
      className={cx(
        'shrink-0 rounded px-1.5 text-xs font-bold tracking-wide uppercase',
        priority === 'urgent' ? 'bg-damper text-white' : 'border border-walnut text-walnut',
      )}
    >
      {priority === 'urgent' ? 'Urgent' : 'High'}
    </span>
  );
}

/** One job on the board: what it is, whose piano, when it is promised, and what holds it up. */
export function JobCard({ job, unit, today, handle, footerExtras, isOverlay = false, className }: JobCardProps) {
  const isLate = isOverdue(job.promisedOn, today);
  const title = isOverlay ? (
    <span className="font-semibold">{job.title}</span>
  ) : (
    <Link to={paths.job.build(job.id)} draggable={false} className="font-semibold text-ink underline-offset-2 hover:underline">
      {job.title}
    </Link>
  );
  return (
    <article
      aria-label={isOverlay ? undefined : job.title}
      className={cx(
        'rounded-md border bg-white p-2.5 text-sm shadow-xs focus-within:border-spruce-deep',
        job.isBlocked ? 'border-damper border-l-4' : 'border-graphite-300',
        className,
      )}
    >
      <div className="flex items-start gap-1.5">
        {handle}
        <h3 className="min-w-0 flex-1 leading-snug">{title}</h3>
        <PriorityMark priority={job.priority} />
        {job.status === 'on_hold' && <span className="shrink-0 rounded bg-graphite-200 px-1.5 text-xs font-semibold">On hold</span>}
      </div>
      <p className="mt-1 text-graphite-700">
        {pianoName(job.piano)} <span className="text-graphite-600">· {pianoShape(job.piano, unit)}</span>
      </p>
      <p className="text-graphite-600">{job.client.name}</p>
      {job.isBlocked && (
        <p className="mt-1 font-semibold text-damper">
          Blocked: <span className="font-normal">{job.blockedReason}</span>
        </p>
      )}
      {job.promisedOn && (
        <p className={cx('mt-1 tabular-figures', isLate ? 'font-semibold text-damper' : 'text-graphite-600')}>
          {isLate ? 'Overdue: promised ' : 'Promised '}
          {formatDay(job.promisedOn)}
        </p>
      )}
      {(job.technicians.length > 0 || footerExtras) && (
        <div className="mt-2 flex min-h-6 flex-wrap items-center justify-between gap-x-2 gap-y-1 border-t border-graphite-200 pt-1.5">
          <TechnicianInitials technicians={job.technicians} />
          {footerExtras && <div className="ml-auto flex flex-wrap items-center justify-end gap-x-2 gap-y-1">{footerExtras}</div>}
        </div>
      )}
    </article>
  );
}
