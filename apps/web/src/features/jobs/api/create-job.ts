import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Job, type CreateJobInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { jobKeys } from './keys';

export const createJob = (input: CreateJobInput) => api.post('/jobs', input, Job);

/** The board picks the new card up from the live event the API sends for it. */
export function useCreateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createJob,
    meta: { handlesError: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.lists() }),
  });
}
