import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { Board } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { boardKeys, type BoardFilters } from './keys';

export function boardSearch(filters: BoardFilters): string {
  const query = new URLSearchParams();
  if (filters.q) query.set('q', filters.q);
  if (filters.blocked) query.set('blocked', 'true');
  if (filters.technicianId) query.set('technicianId', filters.technicianId);
  return query.toString();
}

export const getBoard = (filters: BoardFilters) => {
  const search = boardSearch(filters);
  return api.get(`/board${search ? `?${search}` : ''}`, Board);
};

/** Changing filters keeps the previous board on screen until the new one arrives. */
export const boardQueryOptions = (filters: BoardFilters) =>
  queryOptions({ queryKey: boardKeys.list(filters), queryFn: () => getBoard(filters), placeholderData: keepPreviousData });

export const useBoard = (filters: BoardFilters) => useQuery(boardQueryOptions(filters));
