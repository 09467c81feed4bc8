import { useMutation, useQueryClient } from '@tanstack/react-query';
import { StockMovementResult, type CreateStockMovementInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { partKeys } from './keys';

interface RecordMovementVariables {
  partId: string;
  input: CreateStockMovementInput;
}

export const recordMovement = ({ partId, input }: RecordMovementVariables) =>
  api.post(`/parts/${encodeURIComponent(partId)}/movements`, input, StockMovementResult);

/** A delivery received or a stock-count adjustment; the part's ledger and the lists refresh. */
export function useRecordMovement() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordMovement,
    meta: { handlesError: true },
    onSettled: (_result, _error, { partId }) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: partKeys.detail(partId) }), queryClient.invalidateQueries({ queryKey: partKeys.lists() })]),
  });
}
