import { useState } from 'react';
import { cautionsForTask, type WallTask, type WallTechnician } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { shownRunning, waitingFor, type QueuedClockAction } from '../lib/clock-queue';
import type { LogPartOutcome, SessionStep } from '../hooks/use-technician-session';
import type { PartUse } from '../lib/part-messages';
import { LogPartButton } from './log-part-button';
import { LogPartStep } from './log-part-step';
import { RunningNow } from './running-now';
import { TaskPicker } from './task-picker';
import { WallCautions } from './wall-cautions';

interface TasksStepProps {
  step: Extract<SessionStep, { name: 'tasks' }>;
  technician: WallTechnician;
  waiting: readonly QueuedClockAction[];
  now: number;
  isBusy: boolean;
  onClockOn: (task: WallTask) => void;
  onClockOff: () => void;
  onLogPart: (use: PartUse) => Promise<LogPartOutcome>;
}

/** After the PIN: what they are on (with Clock off, Log a part and any safety caution), and the tasks to clock on to. */
export function TasksStep({ step, technician, waiting, now, isBusy, onClockOn, onClockOff, onLogPart }: TasksStepProps) {
  const [isLogging, setIsLogging] = useState(false);
  const mine = waitingFor(waiting, technician.id);
  const running = step.data ? step.data.running : technician.running;
  const shown = shownRunning(running, mine);
  const runningTaskId = mine.at(-1)?.kind === 'clock-on' ? mine.at(-1)?.task?.id : mine.length === 0 ? running?.task.id : undefined;
  // Parts are logged with the PIN checked just now, never kept on the screen to send later.
  const canLogParts = !step.isOffline && step.data !== null;
  const startLogging = canLogParts ? () => setIsLogging(true) : undefined;
  // The task's stage, when the list has it, adds the moving caution to work in a delivery stage.
  const runningStage = step.data?.tasks.find((t) => t.id === runningTaskId)?.stage?.name;
  const cautions = shown ? cautionsForTask(shown.taskTitle, runningStage) : [];
  const note = isLogging ? undefined : step.note;
  return (
    <div className="mx-auto max-w-7xl space-y-6">
      {step.isOffline && (
        <p role="status" className="rounded-xl bg-graphite-700 p-5 text-xl font-semibold text-white">
          No network, so your PIN could not be checked. What you do now is kept on this screen and sent once the network is back and your PIN is checked here.
          Parts can be logged once the network is back.
        </p>
      )}
      {/* Always present, so what is said here (a part logged, actions sent) is read out when it changes. */}
      <p role="status" className={cx(note ? 'rounded-xl border-4 border-spruce bg-spruce-light p-5 text-xl font-semibold' : 'sr-only')}>
        {note}
      </p>
      {isLogging && step.data ? (
        <LogPartStep tasks={step.data.tasks} runningTaskId={runningTaskId} isBusy={isBusy} onLog={onLogPart} onDone={() => setIsLogging(false)} />
      ) : (
        <>
          {shown && <RunningNow shown={shown} now={now} isBusy={isBusy} onClockOff={onClockOff} onLogPart={startLogging} />}
          <WallCautions cautions={cautions} />
          {!shown && startLogging && <LogPartButton isBusy={isBusy} onClick={startLogging} />}
          <h3 className="text-wall-sm font-bold">{shown ? 'Or switch to another task' : 'Tap a task to clock on'}</h3>
          {step.data ? (
            <TaskPicker tasks={step.data.tasks} runningTaskId={runningTaskId} isBusy={isBusy} onPick={onClockOn} />
          ) : (
            <p className="text-xl text-graphite-700">This screen has no list of your tasks yet. It appears once the network is back.</p>
          )}
        </>
      )}
    </div>
  );
}
