import { queryOptions, useQuery } from '@tanstack/react-query';
import { InvitationPreview } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const getInvitationPreview = (token: string) =>
  api.get(`/invitations/${encodeURIComponent(token)}`, InvitationPreview);

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({ queryKey: authKeys.detail(token), queryFn: () => getInvitationPreview(token) });

export const useInvitationPreview = (token: string) => useQuery(invitationPreviewQueryOptions(token));
