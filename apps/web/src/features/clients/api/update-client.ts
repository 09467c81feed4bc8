import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Client, type UpdateClientInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { clientKeys } from './keys';

interface UpdateClientVariables {
  clientId: string;
  changes: UpdateClientInput;
}

export const updateClient = ({ clientId, changes }: UpdateClientVariables) =>
  api.patch(`/clients/${encodeURIComponent(clientId)}`, changes, Client);

export function useUpdateClient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateClient,
    meta: { handlesError: true },
    onSuccess: (client) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: clientKeys.detail(client.id) }),
        queryClient.invalidateQueries({ queryKey: clientKeys.lists() }),
      ]),
  });
}
