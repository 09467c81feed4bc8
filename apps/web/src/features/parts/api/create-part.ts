import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Part, type CreatePartInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { partKeys } from './keys';

export const createPart = (input: CreatePartInput) => api.post('/parts', input, Part);

export function useCreatePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPart,
    meta: { handlesError: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: partKeys.lists() }),
  });
}
