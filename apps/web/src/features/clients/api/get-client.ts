import { queryOptions, useQuery } from '@tanstack/react-query';
import { ClientDetail } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { clientKeys } from './keys';

export const getClient = (id: string) => api.get(`/clients/${encodeURIComponent(id)}`, ClientDetail);

export const clientQueryOptions = (id: string) => queryOptions({ queryKey: clientKeys.detail(id), queryFn: () => getClient(id) });

export const useClient = (id: string) => useQuery(clientQueryOptions(id));
