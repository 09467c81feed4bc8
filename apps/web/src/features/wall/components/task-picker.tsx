import { useState } from 'react';
import type { WallTask } from '@keybed/shared';
import { controlClasses } from '@/components/text-input';
import { cx } from '@/lib/cx';
import { groupTasks, matchTasks } from '../lib/wall-tasks';
import { TaskButton } from './task-button';

interface TaskPickerProps {
  tasks: readonly WallTask[];
  runningTaskId: string | undefined;
  /** Whether the task they are on can be picked (to log a part to it), not only shown. */
  canPickRunning?: boolean;
  isBusy: boolean;
  onPick: (task: WallTask) => void;
}

/** The technician's own open tasks first, then any open task of an active job; searchable. */
export function TaskPicker({ tasks, runningTaskId, canPickRunning = false, isBusy, onPick }: TaskPickerProps) {
  const [query, setQuery] = useState('');
  const { assigned, others } = groupTasks(matchTasks(tasks, query));
  const button = (task: WallTask) => (
    <li key={task.id}>
      <TaskButton task={task} isRunning={task.id === runningTaskId} canPickRunning={canPickRunning} isBusy={isBusy} onPick={() => onPick(task)} />
    </li>
  );
  return (
    <div className="space-y-5">
      <label className="block text-xl font-semibold">
        Find a task
        <input
          type="search"
          value={query}
          onChange={(e) => setQuery(e.target.value)}
          placeholder="Task, client or piano"
          className={cx(controlClasses, 'mt-1 min-h-16 border-2 text-wall-sm')}
        />
      </label>
      {assigned.length > 0 && (
        <section aria-labelledby="wall-own-tasks" className="space-y-3">
          <h4 id="wall-own-tasks" className="text-wall-sm font-bold">Your tasks</h4>
          <ul className="grid gap-3 xl:grid-cols-2">{assigned.map(button)}</ul>
        </section>
      )}
      {others.length > 0 && (
        <section aria-labelledby="wall-other-tasks" className="space-y-4">
          <h4 id="wall-other-tasks" className="text-wall-sm font-bold">Other open tasks</h4>
          {others.map((group) => (
            <div key={group.job.id} className="space-y-2">
              <h5 className="text-xl font-semibold text-graphite-700">{group.job.title}</h5>
              <ul className="grid gap-3 xl:grid-cols-2">{group.tasks.map(button)}</ul>
            </div>
          ))}
        </section>
      )}
      {assigned.length === 0 && others.length === 0 && (
        <p className="text-xl text-graphite-700">{query ? `No open task matches “${query}”.` : 'No open tasks on active jobs. The foreman adds tasks on each job’s page.'}</p>
      )}
    </div>
  );
}
