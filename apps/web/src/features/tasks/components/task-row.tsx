import type { RunningEntry, Task, TaskStatus } from '@keybed/shared';
import { cautionsForTask, formatHoursMinutes } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { SafetyCautions } from '@/components/safety-caution';
import { Select } from '@/components/select';
import { cx } from '@/lib/cx';
import { elapsedHoursMinutes } from '@/lib/duration';
import { TASK_STATUS_LABELS, TASK_STATUS_OPTIONS } from '../lib/task-labels';

interface TaskRowProps {
  task: Task;
  /** 1-based place in the list. */
  number: number;
  canEdit: boolean;
  canSetStatus: boolean;
  /** Who is clocked on to this task now. */
  runningOn: readonly RunningEntry[];
  now: number;
  isFirst: boolean;
  isLast: boolean;
  isBusy: boolean;
  onStatus: (status: TaskStatus) => void;
  onMove: (step: -1 | 1) => void;
  onEdit: () => void;
}

function Hours({ task }: { task: Task }) {
  const isOver = task.estimatedMinutes !== null && task.loggedMinutes > task.estimatedMinutes;
  return (
    <span className="tabular-figures">
      <span className={cx(isOver && 'font-semibold text-damper')}>Logged {formatHoursMinutes(task.loggedMinutes)}</span>
      {task.estimatedMinutes !== null ? ` of ${formatHoursMinutes(task.estimatedMinutes)} estimated` : ' · no estimate'}
    </span>
  );
}

/** One task: what, which stage, who, hours against the estimate, status, any safety caution, and who is on it now. */
export function TaskRow(props: TaskRowProps) {
  const { task, canEdit, canSetStatus, runningOn, now } = props;
  const assignees = task.assignees.map((a) => a.name).join(', ');
  return (
    <li aria-label={task.title} className={cx('flex flex-wrap items-start gap-x-4 gap-y-2 border-t border-graphite-200 px-4 py-3 first:border-t-0', task.status === 'done' && 'bg-graphite-100')}>
      <span aria-hidden="true" className="w-6 pt-0.5 text-right text-graphite-600 tabular-figures">{props.number}</span>
      <div className="min-w-0 flex-1 basis-64">
        <p className={cx('font-semibold', task.status === 'done' && 'text-graphite-600 line-through decoration-graphite-400')}>{task.title}</p>
        <p className="text-sm text-graphite-600">
          {task.stage?.name ?? 'No stage'} · {assignees || 'Nobody assigned'} · <Hours task={task} />
        </p>
        {task.status !== 'done' && <SafetyCautions cautions={cautionsForTask(task.title, task.stage?.name)} className="mt-1" />}
        {runningOn.map((r) => (
          <p key={r.entryId} className="mt-1 inline-flex items-center gap-2 rounded bg-felt px-2 py-0.5 text-sm font-semibold text-white">
            <span aria-hidden="true" className="size-2 rounded-full bg-white" />
            {r.technician.name} on it now · <span className="tabular-figures">{elapsedHoursMinutes(r.startedAt, now)}</span>
          </p>
        ))}
      </div>
      <div className="flex flex-wrap items-center gap-2">
        {canSetStatus ? (
          <Field label={`Status of ${task.title}`} isLabelHidden>
            {(control) => (
              <Select {...control} isCompact options={TASK_STATUS_OPTIONS} value={task.status} disabled={props.isBusy} onChange={(e) => props.onStatus(e.target.value as TaskStatus)} className="w-36" />
            )}
          </Field>
        ) : (
          <span className="rounded bg-graphite-200 px-2 py-0.5 text-sm font-semibold">{TASK_STATUS_LABELS[task.status]}</span>
        )}
        {canEdit && (
          <>
            <Button size="sm" variant="secondary" onClick={props.onEdit}>
              Edit<span className="sr-only"> {task.title}</span>
            </Button>
            <Button size="sm" variant="quiet" onClick={() => props.onMove(-1)} disabled={props.isFirst || props.isBusy}>
              <span aria-hidden="true">↑</span>
              <span className="sr-only">Move {task.title} up</span>
            </Button>
            <Button size="sm" variant="quiet" onClick={() => props.onMove(1)} disabled={props.isLast || props.isBusy}>
              <span aria-hidden="true">↓</span>
              <span className="sr-only">Move {task.title} down</span>
            </Button>
          </>
        )}
      </div>
    </li>
  );
}
