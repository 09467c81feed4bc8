import { useMutation, useQueryClient } from '@tanstack/react-query';
import { TasksFromTemplateResult } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { taskKeys } from './keys';

export const addTemplateTasks = (jobId: string, stageId: string) =>
  api.post(`/jobs/${encodeURIComponent(jobId)}/tasks/from-template`, { stageId }, TasksFromTemplateResult);

/** Adds the stage template's tasks the job does not have yet, in one request. */
export function useAddTemplateTasks(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stageId: string) => addTemplateTasks(jobId, stageId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: taskKeys.list(jobId) }),
  });
}
