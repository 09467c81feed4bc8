import { useEffect, useId, useRef, useState } from 'react';
import type { WallTechnician, WallTechnicianTasks } from '@keybed/shared';
import { useNow } from '@/lib/use-now';
import { isPinComplete } from '../lib/pin-pad';
import type { ClockQueue } from '../hooks/use-clock-queue';
import { useTechnicianSession } from '../hooks/use-technician-session';
import { IDLE_LIMIT_MS, idleSecondsLeft } from '../lib/idle';
import type { WallNotice } from '../lib/wall-notice';
import { PinPad } from './pin-pad';
import { TasksStep } from './tasks-step';

interface TechnicianPanelProps {
  technician: WallTechnician;
  queue: ClockQueue;
  cachedTasks: WallTechnicianTasks | undefined;
  onTasksLoaded: (data: WallTechnicianTasks) => void;
  onClose: (notice?: WallNotice) => void;
  onUnpaired: () => void;
}

/** Keeps the context open while it is being used; any touch or key starts the 30 seconds again. */
function useIdleClose(onIdle: () => void, isPaused: boolean) {
  const [lastActivity, setLastActivity] = useState(() => Date.now());
  const now = useNow(250);
  const secondsLeft = idleSecondsLeft(lastActivity, now, IDLE_LIMIT_MS);
  useEffect(() => {
    const touch = () => setLastActivity(Date.now());
    document.addEventListener('pointerdown', touch);
    document.addEventListener('keydown', touch);
    return () => {
      document.removeEventListener('pointerdown', touch);
      document.removeEventListener('keydown', touch);
    };
  }, []);
  useEffect(() => {
    if (secondsLeft === 0 && !isPaused) onIdle();
  }, [secondsLeft, isPaused, onIdle]);
  return { secondsLeft, now };
}

/** One technician's turn: PIN, then their tasks, clock off and parts used. Closes after a clock action or 30 s idle. */
export function TechnicianPanel(props: TechnicianPanelProps) {
  const { technician, onClose } = props;
  const titleId = useId();
  const session = useTechnicianSession(props);
  const [digits, setDigits] = useState('');
  const { secondsLeft, now } = useIdleClose(onClose, session.isBusy);
  const heading = useRef<HTMLHeadingElement>(null);

  // Focus starts in the panel; Escape closes it like the Close button.
  useEffect(() => heading.current?.focus(), []);
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => event.key === 'Escape' && onClose();
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [onClose]);

  const enter = (next: string) => {
    setDigits(next);
    if (isPinComplete(next)) {
      setDigits('');
      void session.check(next);
    }
  };

  return (
    <div role="dialog" aria-modal="true" aria-labelledby={titleId} className="fixed inset-0 z-40 flex flex-col bg-paper text-ink">
      <header className="flex flex-wrap items-center gap-x-6 gap-y-2 border-b-4 border-graphite-300 bg-white px-6 py-3 lg:px-10">
        <h2 id={titleId} ref={heading} tabIndex={-1} className="text-wall font-bold">
          {technician.name}
        </h2>
        <p className="ml-auto text-xl text-graphite-700 tabular-figures">Closes in {secondsLeft} s</p>
        <button type="button" onClick={() => onClose()} className="min-h-16 rounded-xl border-2 border-graphite-400 bg-white px-8 text-wall-sm font-semibold active:bg-graphite-200">
          Close
        </button>
      </header>
      <div className="flex-1 overflow-y-auto px-6 py-6 lg:px-10">
        {session.step.name === 'blocked' && (
          <p role="alert" className="mx-auto max-w-3xl rounded-xl border-4 border-damper bg-white p-8 text-wall-sm font-semibold">
            {session.step.text}
          </p>
        )}
        {session.step.name === 'pin' && (
          <PinPad pin={digits} onChange={enter} onSubmit={() => isPinComplete(digits) && enter(digits)} isBusy={session.isBusy} message={session.step.message} />
        )}
        {session.step.name === 'tasks' && (
          <TasksStep step={session.step} technician={technician} waiting={props.queue.actions} now={now} isBusy={session.isBusy} onClockOn={session.clockOn} onClockOff={session.clockOff} onLogPart={session.logPart} />
        )}
      </div>
    </div>
  );
}
