import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Job, type UpdateJobInput } from '@keybed/shared';
import { api, errorDetail } from '@/lib/api-client';
import { jobKeys } from './keys';

interface UpdateJobVariables {
  jobId: string;
  changes: UpdateJobInput;
}

export const updateJob = ({ jobId, changes }: UpdateJobVariables) => api.patch(`/jobs/${encodeURIComponent(jobId)}`, changes, Job);

/** The job as it is now, sent with a 409 when the edit was based on an older version. */
export const conflictingJob = (error: unknown) => errorDetail(error, 'current', Job);

/** Edits carry `version`; the form handles a 409 itself, keeping what the member typed. */
export function useUpdateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateJob,
    meta: { handlesError: true },
    onSettled: (_job, _error, { jobId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) }),
        queryClient.invalidateQueries({ queryKey: jobKeys.lists() }),
      ]),
  });
}
