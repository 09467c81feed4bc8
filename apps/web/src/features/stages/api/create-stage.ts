import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Stage, type CreateStageInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { stageKeys } from './keys';

export const createStage = (input: CreateStageInput) => api.post('/stages', input, Stage);

export function useCreateStage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStage,
    meta: { handlesError: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stageKeys.lists() }),
  });
}
