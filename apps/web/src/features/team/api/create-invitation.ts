import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Invitation, type CreateInvitationInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

export const createInvitation = (input: CreateInvitationInput) => api.post('/team/invitations', input, Invitation);

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    meta: { handlesError: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.invitations.lists() }),
  });
}
