import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Task, type CreateTaskInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { taskKeys } from './keys';

export const createTask = (jobId: string, input: CreateTaskInput) => api.post(`/jobs/${encodeURIComponent(jobId)}/tasks`, input, Task);

/** Adds a task at the end of the job's list; the form shows field errors itself. */
export function useCreateTask(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateTaskInput) => createTask(jobId, input),
    meta: { handlesError: true },
    onSettled: () => queryClient.invalidateQueries({ queryKey: taskKeys.list(jobId) }),
  });
}
