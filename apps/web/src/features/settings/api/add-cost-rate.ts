import { useMutation, useQueryClient } from '@tanstack/react-query';
import { CostRateList, type CreateCostRateInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { settingsKeys } from './keys';

interface AddCostRateVariables {
  membershipId: string;
  input: CreateCostRateInput;
}

export const addCostRate = ({ membershipId, input }: AddCostRateVariables) =>
  api.post(`/team/members/${encodeURIComponent(membershipId)}/cost-rates`, input, CostRateList);

/** Adds a rate from a date; the form shows a refused date (time already costed) on its field. */
export function useAddCostRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addCostRate,
    meta: { handlesError: true },
    onSuccess: (list, { membershipId }) => queryClient.setQueryData(settingsKeys.costRates(membershipId), list),
  });
}
