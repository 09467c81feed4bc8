import { useId } from 'react';
import type { WallTechnician } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { elapsedHoursMinutes } from '@/lib/duration';
import type { ShownRunning } from '../lib/clock-queue';
import { lockedMinutes } from '../lib/wall-messages';

interface TechnicianTileProps {
  technician: WallTechnician;
  timeZone: string;
  shown: ShownRunning | null;
  /** Actions of theirs waiting on this screen. */
  waitingCount: number;
  now: number;
  onOpen: () => void;
}

const clockTime = (iso: string, timeZone: string) =>
  new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone }).format(new Date(iso));

/** One person on the wall: what they are on and for how long. Tapping opens their PIN pad. */
export function TechnicianTile({ technician, timeZone, shown, waitingCount, now, onOpen }: TechnicianTileProps) {
  const statusId = useId();
  const isLocked = technician.lockedUntil !== null && Date.parse(technician.lockedUntil) > now;
  const isRunning = shown !== null;
  return (
    <button
      type="button"
      aria-label={technician.name}
      aria-describedby={statusId}
      onClick={onOpen}
      className={cx(
        'flex min-h-56 w-full flex-1 flex-col items-start gap-2 rounded-xl border-4 p-6 text-left shadow-sm active:translate-y-px',
        isRunning ? 'bg-felt text-white' : 'bg-white text-ink',
        isLocked ? 'border-damper' : isRunning ? 'border-felt' : 'border-graphite-300',
      )}
    >
      <span className="text-wall font-bold">{technician.name}</span>
      <span id={statusId} className="flex w-full flex-1 flex-col gap-1">
        {shown ? (
          <>
            <span className="text-wall-sm font-semibold">{shown.taskTitle}</span>
            <span className="text-xl opacity-90">{shown.jobTitle}</span>
            <span className="mt-auto flex flex-wrap items-baseline gap-x-4">
              <span className="sr-only">Clocked on for </span>
              <span className="text-wall-lg font-bold tabular-figures">{elapsedHoursMinutes(shown.startedAt, now)}</span>
              <span className="text-xl tabular-figures">since {clockTime(shown.startedAt, timeZone)}</span>
            </span>
          </>
        ) : (
          <span className="text-xl text-graphite-600">Not clocked on</span>
        )}
        {waitingCount > 0 && (
          <span className={cx('w-fit rounded px-2 text-xl font-semibold', isRunning ? 'bg-white text-felt' : 'bg-graphite-700 text-white')}>
            {waitingCount === 1 ? '1 action' : `${waitingCount} actions`} waiting to send
          </span>
        )}
        {isLocked && (
          <span className="w-fit rounded bg-damper px-2 text-xl font-semibold text-white">
            PIN locked · {lockedMinutes(technician.lockedUntil!, now)} min
          </span>
        )}
        {!technician.hasPin && <span className={cx('text-xl', isRunning ? 'text-white' : 'text-graphite-600')}>No PIN yet</span>}
      </span>
    </button>
  );
}
