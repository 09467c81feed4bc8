import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Me, type AcceptInvitationInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const acceptInvitation = (input: AcceptInvitationInput) => api.post('/invitations/accept', input, Me);

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    meta: { handlesError: true },
    onSuccess: (me) => {
      queryClient.removeQueries();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
