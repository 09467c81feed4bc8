import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Estimate, JobEstimates } from '@keybed/shared';
import { estimateKeys } from './keys';

/**
 * The cache effect every estimate action shares: the answer replaces its estimate in the job's
 * list at once, then the list is read again (an action may supersede other revisions). Accepting
 * also changes task budgets and costing; the job's live events refresh those.
 */
export function useEstimateMutation<V>(jobId: string, mutationFn: (variables: V) => Promise<Estimate>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    meta: { handlesError: true },
    onSuccess: (estimate) =>
      queryClient.setQueryData<JobEstimates>(estimateKeys.list(jobId), (current) =>
        current && current.estimates.some((e) => e.id === estimate.id)
          ? { ...current, estimates: current.estimates.map((e) => (e.id === estimate.id ? estimate : e)) }
          : current,
      ),
    onSettled: () => queryClient.invalidateQueries({ queryKey: estimateKeys.list(jobId) }),
  });
}
