import { queryOptions, useQuery } from '@tanstack/react-query';
import { Piano } from '@keybed/shared';
import { api, field } from '@/lib/api-client';
import { pianoKeys, type PianoFilters } from './keys';

export const getPianos = (filters: PianoFilters) => {
  const query = new URLSearchParams();
  if (filters.clientId) query.set('clientId', filters.clientId);
  if (filters.q) query.set('q', filters.q);
  const search = query.toString();
  return api.get(`/pianos${search ? `?${search}` : ''}`, field('pianos', Piano.array()));
};

export const pianosQueryOptions = (filters: PianoFilters) =>
  queryOptions({ queryKey: pianoKeys.list(filters), queryFn: () => getPianos(filters) });

export const usePianos = (filters: PianoFilters, options: { isEnabled?: boolean } = {}) =>
  useQuery({ ...pianosQueryOptions(filters), enabled: options.isEnabled ?? true });
