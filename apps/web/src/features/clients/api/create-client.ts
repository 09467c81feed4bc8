import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Client, type CreateClientInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { clientKeys } from './keys';

export const createClient = (input: CreateClientInput) => api.post('/clients', input, Client);

export function useCreateClient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClient,
    meta: { handlesError: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clientKeys.lists() }),
  });
}
