import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

export const revokeInvitation = (invitationId: string) =>
  api.delete(`/team/invitations/${encodeURIComponent(invitationId)}`);

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSettled: () => queryClient.invalidateQueries({ queryKey: teamKeys.invitations.lists() }),
  });
}
