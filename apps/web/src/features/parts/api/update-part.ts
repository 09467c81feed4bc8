import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Part, type UpdatePartInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { partKeys } from './keys';

interface UpdatePartVariables {
  partId: string;
  changes: UpdatePartInput;
}

export const updatePart = ({ partId, changes }: UpdatePartVariables) => api.patch(`/parts/${encodeURIComponent(partId)}`, changes, Part);

export function useUpdatePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePart,
    meta: { handlesError: true },
    onSettled: (_part, _error, { partId }) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: partKeys.detail(partId) }), queryClient.invalidateQueries({ queryKey: partKeys.lists() })]),
  });
}
