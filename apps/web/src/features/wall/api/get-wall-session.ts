import { queryOptions, useQuery } from '@tanstack/react-query';
import { WallPairing } from '@keybed/shared';
import { api, isApiError } from '@/lib/api-client';
import { wallKeys } from './keys';

export const getWallSession = () => api.get('/wall/session', WallPairing);

/** Which workshop this screen belongs to. Asked again every few hours, which renews the device cookie. */
export const wallSessionQueryOptions = () =>
  queryOptions({
    queryKey: wallKeys.session(),
    queryFn: getWallSession,
    staleTime: Infinity,
    refetchInterval: 6 * 3600_000,
    retry: (count, error) => count < 3 && !(isApiError(error) && error.code === 'wall_not_paired'),
  });

export const useWallSession = () => useQuery(wallSessionQueryOptions());
