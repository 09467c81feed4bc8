import type { Task, UpdateTaskInput } from '@keybed/shared';

/** Tasks in their list order. */
export const inOrder = (tasks: readonly Task[]) => [...tasks].sort((a, b) => a.position - b.position);

/**
 * The list as it will look after `changes` to one task: plain fields applied, and a new position
 * moving the task there with the others renumbered 0…n−1 (as the API renumbers them).
 */
export function applyTaskChange(tasks: readonly Task[], taskId: string, changes: UpdateTaskInput): Task[] {
  const { version: _version, assigneeIds: _assignees, stageId: _stage, position, ...fields } = changes;
  const ordered = inOrder(tasks).map((t) => (t.id === taskId ? { ...t, ...definedOnly(fields) } : t));
  if (position === undefined) return ordered;
  const from = ordered.findIndex((t) => t.id === taskId);
  if (from < 0) return ordered;
  const [moved] = ordered.splice(from, 1);
  ordered.splice(Math.min(position, ordered.length), 0, moved!);
  return ordered.map((t, i) => ({ ...t, position: i }));
}

/** The 0-based place a task moves to one step up (−1) or down (+1); undefined at either end. */
export function stepTarget(tasks: readonly Task[], taskId: string, step: -1 | 1): number | undefined {
  const index = inOrder(tasks).findIndex((t) => t.id === taskId);
  const target = index + step;
  return index < 0 || target < 0 || target >= tasks.length ? undefined : target;
}

function definedOnly<T extends object>(value: T): Partial<T> {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>;
}
