import { queryOptions, useQuery } from '@tanstack/react-query';
import { Me } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const getMe = () => api.get('/me', Me);

export const meQueryOptions = () =>
  queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 5 * 60_000 });

export const useMe = () => useQuery(meQueryOptions());
