import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { TimeEntry, TimeEntrySource } from '@keybed/shared';
import { formatHoursMinutes } from '@keybed/shared';
import { Button } from '@/components/button';
import { paths } from '@/config/paths';
import { cx } from '@/lib/cx';
import { localClockTime } from '../lib/week';
import { CorrectionForm, type TaskFieldProps } from './correction-form';
import { CorrectionTrail } from './correction-trail';

const SOURCE_LABELS: Record<TimeEntrySource, string> = { wall: 'Wall screen', web: 'Web', correction: 'Added by the foreman' };

interface EntryRowProps {
  entry: TimeEntry;
  /** Minutes of the entry that fall on this day. */
  minutes: number;
  timeZone: string;
  canCorrect: boolean;
  renderTaskField: (props: TaskFieldProps) => ReactNode;
}

/** One time entry on a day, flagged when it waits for review, with its correction trail beside it. */
export function EntryRow({ entry, minutes, timeZone, canCorrect, renderTaskField }: EntryRowProps) {
  const [isCorrecting, setIsCorrecting] = useState(false);
  const isRunning = entry.endedAt === null;
  const range = `${localClockTime(entry.startedAt, timeZone)} – ${isRunning ? 'now' : localClockTime(entry.endedAt!, timeZone)}`;
  return (
    <li
      aria-label={`${range}, ${entry.task.title}`}
      className={cx('grid gap-3 border-t border-graphite-200 px-4 py-3 first:border-t-0', entry.corrections.length > 0 && 'lg:grid-cols-[1fr_20rem]', entry.needsReview && 'bg-spruce-light')}
    >
      <div className="min-w-0">
        <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
          <span className="w-28 shrink-0 font-semibold tabular-figures">{range}</span>
          <span className="min-w-48 flex-1">
            <span className="font-semibold">{entry.task.title}</span>
            <span className="text-graphite-600"> · </span>
            <Link to={paths.job.build(entry.job.id)} className="text-graphite-700 underline underline-offset-2">
              {entry.job.title}
            </Link>
          </span>
          <span className="ml-auto font-semibold tabular-figures">{formatHoursMinutes(minutes)}</span>
        </div>
        <p className="mt-1 flex flex-wrap gap-2 text-sm">
          <span className="text-graphite-600">{SOURCE_LABELS[entry.source]}</span>
          {isRunning && <span className="rounded bg-felt px-1.5 font-semibold text-white">Running</span>}
          {entry.needsReview && (
            <span className="rounded border border-spruce-deep px-1.5 font-semibold text-ink">
              Needs review{entry.reviewReason ? `: ${entry.reviewReason}` : ''}
            </span>
          )}
          {entry.isLocked && <span className="rounded bg-graphite-200 px-1.5 font-semibold">Approved week</span>}
        </p>
        {canCorrect && !isCorrecting && (
          <Button size="sm" variant="secondary" className="mt-2" onClick={() => setIsCorrecting(true)}>
            Correct<span className="sr-only"> the entry {range} on {entry.task.title}</span>
          </Button>
        )}
        {isCorrecting && <CorrectionForm entry={entry} timeZone={timeZone} renderTaskField={renderTaskField} onDone={() => setIsCorrecting(false)} />}
      </div>
      <CorrectionTrail corrections={entry.corrections} timeZone={timeZone} />
    </li>
  );
}
