import type { WallTask, WallTechnician } from '@keybed/shared';
import { shownRunning, waitingFor, type QueuedClockAction } from '../lib/clock-queue';
import type { SessionStep } from '../hooks/use-technician-session';
import { RunningNow } from './running-now';
import { TaskPicker } from './task-picker';

interface TasksStepProps {
  step: Extract<SessionStep, { name: 'tasks' }>;
  technician: WallTechnician;
  waiting: readonly QueuedClockAction[];
  now: number;
  isBusy: boolean;
  onClockOn: (task: WallTask) => void;
  onClockOff: () => void;
}

/** After the PIN: what they are on (with Clock off), and the tasks to clock on to. */
export function TasksStep({ step, technician, waiting, now, isBusy, onClockOn, onClockOff }: TasksStepProps) {
  const mine = waitingFor(waiting, technician.id);
  const running = step.data ? step.data.running : technician.running;
  const shown = shownRunning(running, mine);
  const runningTaskId = mine.at(-1)?.kind === 'clock-on' ? mine.at(-1)?.task?.id : mine.length === 0 ? running?.task.id : undefined;
  return (
    <div className="mx-auto max-w-7xl space-y-6">
      {step.isOffline && (
        <p role="status" className="rounded-xl bg-graphite-700 p-5 text-xl font-semibold text-white">
          No network, so your PIN could not be checked. What you do now is kept on this screen and sent once the network is back and your PIN is checked here.
        </p>
      )}
      {step.note && (
        <p role="status" className="rounded-xl border-4 border-spruce bg-spruce-light p-5 text-xl font-semibold">
          {step.note}
        </p>
      )}
      {shown && <RunningNow shown={shown} now={now} isBusy={isBusy} onClockOff={onClockOff} />}
      <h3 className="text-wall-sm font-bold">{shown ? 'Or switch to another task' : 'Tap a task to clock on'}</h3>
      {step.data ? (
        <TaskPicker tasks={step.data.tasks} runningTaskId={runningTaskId} isBusy={isBusy} onPick={onClockOn} />
      ) : (
        <p className="text-xl text-graphite-700">This screen has no list of your tasks yet. It appears once the network is back.</p>
      )}
    </div>
  );
}
