import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SubletBill, type CreateSubletBillInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { costingKeys } from './keys';

export const addSubletBill = ({ jobId, input }: { jobId: string; input: CreateSubletBillInput }) =>
  api.post(`/jobs/${encodeURIComponent(jobId)}/sublet-bills`, input, SubletBill);

/** A supplier's bill for work sent out: it joins the job's cost to date (owner). */
export function useAddSubletBill() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addSubletBill,
    meta: { handlesError: true },
    onSettled: (_bill, _error, { jobId }) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: costingKeys.job(jobId) }), queryClient.invalidateQueries({ queryKey: costingKeys.reports() })]),
  });
}
