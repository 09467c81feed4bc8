import type { WallTask } from '@keybed/shared';

interface TaskButtonProps {
  task: WallTask;
  isRunning: boolean;
  /** Clocking on to the task already running makes no sense; logging a part to it does. */
  canPickRunning?: boolean;
  isBusy: boolean;
  onPick: () => void;
}

/** A task to pick: its title large, then the job, piano and client. */
export function TaskButton({ task, isRunning, canPickRunning = false, isBusy, onPick }: TaskButtonProps) {
  return (
    <button
      type="button"
      onClick={onPick}
      disabled={isBusy || (isRunning && !canPickRunning)}
      className="flex h-full min-h-20 w-full flex-col items-start justify-center gap-1 rounded-xl border-2 border-graphite-400 bg-white px-5 py-3 text-left shadow-sm active:bg-graphite-200 disabled:border-felt disabled:bg-felt-light"
    >
      <span className="text-wall-sm font-semibold">
        {task.title}
        {isRunning && <span className="ml-3 rounded bg-felt px-2 text-xl text-white">On now</span>}
      </span>
      <span className="text-xl text-graphite-700">
        {task.job.title} · {task.job.pianoLabel} · {task.job.clientName}
        {task.stage && ` · ${task.stage.name}`}
      </span>
    </button>
  );
}
