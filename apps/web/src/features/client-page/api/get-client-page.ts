import { queryOptions, useQuery } from '@tanstack/react-query';
import { ClientPage } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { clientPageKeys } from './keys';

export const getClientPage = (token: string) => api.get(`/client/${encodeURIComponent(token)}`, ClientPage);

/** Refused links (expired, withdrawn, replaced) will not change by asking again, so they are not retried. */
export const clientPageQueryOptions = (token: string) =>
  queryOptions({ queryKey: clientPageKeys.detail(token), queryFn: () => getClientPage(token), staleTime: 60_000, refetchOnWindowFocus: false });

export const useClientPage = (token: string, options: { pollMs?: number | false } = {}) =>
  useQuery({ ...clientPageQueryOptions(token), refetchInterval: options.pollMs ?? false });

export const clientPhotoUrl = (token: string, photoId: string, size: 'web' | 'thumb') =>
  `/api/client/${encodeURIComponent(token)}/photos/${encodeURIComponent(photoId)}${size === 'thumb' ? '?size=thumb' : ''}`;
