import { queryOptions, useQuery } from '@tanstack/react-query';
import { Invitation } from '@keybed/shared';
import { api, field } from '@/lib/api-client';
import { teamKeys } from './keys';

export const getInvitations = () =>
  api.get('/team/invitations', field('invitations', Invitation.array()));

export const invitationsQueryOptions = () =>
  queryOptions({ queryKey: teamKeys.invitations.list(), queryFn: getInvitations });

export const useInvitations = () => useQuery(invitationsQueryOptions());
