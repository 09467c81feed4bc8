import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Stage, type UpdateStageInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { stageKeys } from './keys';

interface UpdateStageVariables {
  stageId: string;
  changes: UpdateStageInput;
}

export const updateStage = ({ stageId, changes }: UpdateStageVariables) =>
  api.patch(`/stages/${encodeURIComponent(stageId)}`, changes, Stage);

/** Rename, WIP limit, archive or restore; each row shows its own errors. */
export function useUpdateStage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStage,
    meta: { handlesError: true },
    onSettled: () => queryClient.invalidateQueries({ queryKey: stageKeys.lists() }),
  });
}
