import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { Client } from '@keybed/shared';
import { api, field } from '@/lib/api-client';
import { clientKeys, type ClientFilters } from './keys';

export const getClients = ({ q }: ClientFilters) => {
  const query = new URLSearchParams();
  if (q) query.set('q', q);
  const search = query.toString();
  return api.get(`/clients${search ? `?${search}` : ''}`, field('clients', Client.array()));
};

export const clientsQueryOptions = (filters: ClientFilters) =>
  queryOptions({ queryKey: clientKeys.list(filters), queryFn: () => getClients(filters), placeholderData: keepPreviousData });

export const useClients = (filters: ClientFilters) => useQuery(clientsQueryOptions(filters));
