import { elapsedHoursMinutes } from '@/lib/duration';
import type { ShownRunning } from '../lib/clock-queue';
import { LogPartButton } from './log-part-button';

interface RunningNowProps {
  shown: ShownRunning;
  now: number;
  isBusy: boolean;
  onClockOff: () => void;
  /** Absent when parts cannot be logged now (no network). */
  onLogPart?: (() => void) | undefined;
}

/** What the technician is on, for how long, the big button to stop it, and the one to log a part to it. */
export function RunningNow({ shown, now, isBusy, onClockOff, onLogPart }: RunningNowProps) {
  return (
    <section aria-labelledby="wall-running-now" className="flex flex-wrap items-center gap-6 rounded-xl bg-felt p-6 text-white">
      <div className="min-w-0 flex-1">
        <h3 id="wall-running-now" className="text-xl font-semibold">
          On now{shown.isWaiting && ' (waiting to send)'}
        </h3>
        <p className="text-wall font-bold">{shown.taskTitle}</p>
        <p className="text-xl">{shown.jobTitle}</p>
        <p className="text-wall-lg font-bold tabular-figures">{elapsedHoursMinutes(shown.startedAt, now)}</p>
      </div>
      {onLogPart && <LogPartButton isOnBand isBusy={isBusy} onClick={onLogPart} />}
      <button
        type="button"
        onClick={onClockOff}
        disabled={isBusy}
        className="min-h-24 min-w-64 rounded-xl border-4 border-white bg-white px-8 text-wall font-bold text-felt shadow-md active:bg-felt-light disabled:opacity-60"
      >
        Clock off
      </button>
    </section>
  );
}
