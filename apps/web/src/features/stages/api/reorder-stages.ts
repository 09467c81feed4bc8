import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Stage } from '@keybed/shared';
import { api, field } from '@/lib/api-client';
import { stagesQueryOptions } from './get-stages';
import { stageKeys } from './keys';

export const reorderStages = (stageIds: string[]) => api.post('/stages/reorder', { stageIds }, field('stages', Stage.array()));

/** Shows the new order at once, puts the old one back if the API refuses, then settles from the server. */
export function useReorderStages() {
  const queryClient = useQueryClient();
  const listKey = stagesQueryOptions().queryKey;
  return useMutation({
    mutationFn: reorderStages,
    onMutate: async (stageIds) => {
      await queryClient.cancelQueries({ queryKey: stageKeys.lists() });
      const previous = queryClient.getQueryData(listKey);
      queryClient.setQueryData(listKey, (stages) =>
        stages?.map((stage) => {
          const index = stageIds.indexOf(stage.id);
          return index === -1 ? stage : { ...stage, position: index };
        }),
      );
      return { previous };
    },
    onError: (_error, _variables, context) => {
      if (context?.previous) queryClient.setQueryData(listKey, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: stageKeys.lists() }),
  });
}
