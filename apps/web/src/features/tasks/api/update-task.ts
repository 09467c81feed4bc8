import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Task, TaskList, type UpdateTaskInput } from '@keybed/shared';
import { api, errorDetail } from '@/lib/api-client';
import { applyTaskChange } from '../lib/task-order';
import { taskKeys } from './keys';

interface UpdateTaskVariables {
  taskId: string;
  changes: UpdateTaskInput;
}

export const updateTask = ({ taskId, changes }: UpdateTaskVariables) => api.patch(`/tasks/${encodeURIComponent(taskId)}`, changes, Task);

/** The task as it is now, sent with a 409 when the edit was based on an older version. */
export const conflictingTask = (error: unknown) => errorDetail(error, 'current', Task);

/**
 * Status and order changes show at once and are put back if the API refuses; every edit settles
 * with one refetch of the job's list. `handlesError` callers show their own message.
 */
export function useUpdateTask(jobId: string, options: { handlesError?: boolean } = {}) {
  const queryClient = useQueryClient();
  const listKey = taskKeys.list(jobId);
  return useMutation({
    mutationFn: updateTask,
    meta: { handlesError: options.handlesError ?? false },
    onMutate: async ({ taskId, changes }) => {
      await queryClient.cancelQueries({ queryKey: listKey });
      const previous = queryClient.getQueryData<TaskList>(listKey);
      if (previous) queryClient.setQueryData<TaskList>(listKey, { tasks: applyTaskChange(previous.tasks, taskId, changes) });
      return { previous };
    },
    // The saved task carries its new version, so a quick second change is not refused as stale.
    onSuccess: (saved) =>
      queryClient.setQueryData<TaskList>(listKey, (current) => current && { tasks: current.tasks.map((t) => (t.id === saved.id ? saved : t)) }),
    onError: (_error, _variables, context) => {
      if (context?.previous) queryClient.setQueryData(listKey, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: listKey }),
  });
}
