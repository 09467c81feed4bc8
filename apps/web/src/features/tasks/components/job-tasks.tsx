import { useState } from 'react';
import type { RunningEntry, Task, TaskStatus } from '@keybed/shared';
import { formatHoursMinutes } from '@keybed/shared';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { useNow } from '@/lib/use-now';
import { useJobTasks } from '../api/get-job-tasks';
import { useUpdateTask } from '../api/update-task';
import { inOrder, stepTarget } from '../lib/task-order';
import type { Person } from './assignee-picker';
import { TaskForm } from './task-form';
import { TaskRow } from './task-row';
import { TemplateButton } from './template-button';

export interface JobTasksProps {
  jobId: string;
  /** The job's current stage, for "Add the <stage> tasks" and new tasks' default stage. */
  currentStage: { id: string; name: string } | undefined;
  /** Owner and foreman add, edit, assign and reorder. */
  canEdit: boolean;
  /** The signed-in member's user id: technicians may set the status of tasks assigned to them. */
  userId: string;
  stages: readonly Person[];
  people: readonly Person[];
  running: readonly RunningEntry[];
}

function Totals({ tasks }: { tasks: Task[] }) {
  const estimated = tasks.reduce((sum, t) => sum + (t.estimatedMinutes ?? 0), 0);
  const logged = tasks.reduce((sum, t) => sum + t.loggedMinutes, 0);
  const done = tasks.filter((t) => t.status === 'done').length;
  return (
    <p className="text-sm text-graphite-600 tabular-figures">
      {done} of {tasks.length} done · {formatHoursMinutes(logged)} logged of {formatHoursMinutes(estimated)} estimated
    </p>
  );
}

/** The job's tasks in order; owner and foreman manage them, technicians read and mark their own. */
export function JobTasks(props: JobTasksProps) {
  const { jobId, canEdit, currentStage } = props;
  const tasks = useJobTasks(jobId);
  const update = useUpdateTask(jobId);
  const now = useNow(30_000);
  const [editing, setEditing] = useState<string | 'new' | null>(null);

  if (tasks.isPending) {
    return (
      <LoadingRegion label="Loading tasks">
        <Skeleton className="h-40 w-full" />
      </LoadingRegion>
    );
  }
  if (tasks.isError) return <ErrorState error={tasks.error} headingLevel="h3" onRetry={() => void tasks.refetch()} isRetrying={tasks.isFetching} />;

  const list = inOrder(tasks.data);
  const formProps = { jobId, stages: props.stages, people: props.people, onDone: () => setEditing(null) };
  const change = (task: Task, changes: { status?: TaskStatus; position?: number }) => update.mutate({ taskId: task.id, changes: { version: task.version, ...changes } });

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        {list.length > 0 ? <Totals tasks={list} /> : <span />}
        {canEdit && (
          <div className="flex flex-wrap gap-2">
            {currentStage && <TemplateButton jobId={jobId} stage={currentStage} />}
            {editing !== 'new' && <Button onClick={() => setEditing('new')}>Add a task</Button>}
          </div>
        )}
      </div>
      {editing === 'new' && <TaskForm {...formProps} defaultStageId={currentStage?.id} />}
      {list.length === 0 ? (
        editing !== 'new' && (
          <EmptyState title="No tasks yet" headingLevel="h3">
            <p>{canEdit ? 'Add the stage’s tasks in one go, or add tasks one by one and assign them.' : 'The foreman adds the tasks for this job.'}</p>
          </EmptyState>
        )
      ) : (
        <ol aria-label="Tasks" className="rounded-lg border border-graphite-300 bg-white">
          {list.map((task, index) =>
            editing === task.id ? (
              <li key={task.id} className="border-t border-graphite-200 p-2 first:border-t-0">
                <TaskForm {...formProps} task={task} />
              </li>
            ) : (
              <TaskRow
                key={task.id}
                task={task}
                number={index + 1}
                canEdit={canEdit}
                canSetStatus={canEdit || task.assignees.some((a) => a.id === props.userId)}
                runningOn={props.running.filter((r) => r.task.id === task.id)}
                now={now}
                isFirst={index === 0}
                isLast={index === list.length - 1}
                isBusy={update.isPending}
                onStatus={(status) => change(task, { status })}
                onMove={(step) => {
                  const position = stepTarget(list, task.id, step);
                  if (position !== undefined) change(task, { position });
                }}
                onEdit={() => setEditing(task.id)}
              />
            ),
          )}
        </ol>
      )}
    </div>
  );
}
