import type { TaskStatus } from '@keybed/shared';

export const TASK_STATUS_LABELS: Record<TaskStatus, string> = { todo: 'To do', in_progress: 'In progress', done: 'Done' };

export const TASK_STATUS_OPTIONS = (Object.keys(TASK_STATUS_LABELS) as TaskStatus[]).map((value) => ({ value, label: TASK_STATUS_LABELS[value] }));
