import { useMutation, useQueryClient } from '@tanstack/react-query';
import { StockMovementResult, type PartsUsedCorrectionInput, type PartsUsedInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { partKeys } from './keys';

interface LogVariables {
  taskId: string;
  input: PartsUsedInput;
}
interface CorrectVariables {
  taskId: string;
  input: PartsUsedCorrectionInput;
}

export const logPartsUsed = ({ taskId, input }: LogVariables) => api.post(`/tasks/${encodeURIComponent(taskId)}/parts-used`, input, StockMovementResult);

export const correctPartsUsed = ({ taskId, input }: CorrectVariables) =>
  api.post(`/tasks/${encodeURIComponent(taskId)}/parts-used/corrections`, input, StockMovementResult);

function useAfterStockChange() {
  const queryClient = useQueryClient();
  return (taskId: string, partId: string) =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: partKeys.usedOnTask(taskId) }),
      queryClient.invalidateQueries({ queryKey: partKeys.detail(partId) }),
      queryClient.invalidateQueries({ queryKey: partKeys.lists() }),
    ]);
}

/** Parts taken from stock for a task (a technician's own task, or any for the owner and foreman). */
export function useLogPartsUsed() {
  const after = useAfterStockChange();
  return useMutation({ mutationFn: logPartsUsed, meta: { handlesError: true }, onSettled: (_r, _e, v) => after(v.taskId, v.input.partId) });
}

/** The foreman's or owner's correction of a wrong record, with its reason. */
export function useCorrectPartsUsed() {
  const after = useAfterStockChange();
  return useMutation({ mutationFn: correctPartsUsed, meta: { handlesError: true }, onSettled: (_r, _e, v) => after(v.taskId, v.input.partId) });
}
