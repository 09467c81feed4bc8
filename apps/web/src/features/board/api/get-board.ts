import { useEffect } from 'react';
import { keepPreviousData, queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
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

/**
 * Live events bring every change, but the cards' logged minutes also grow while someone is
 * clocked on, with no event: a board in view is read again each minute (an unchanged one answers
 * 304), except while a move is in flight, which settles with its own read.
 */
const REFRESH_MS = 60_000;

export function useBoard(filters: BoardFilters) {
  const queryClient = useQueryClient();
  useEffect(() => {
    const timer = setInterval(() => {
      if (document.visibilityState !== 'visible' || queryClient.isMutating({ mutationKey: boardKeys.moves() }) > 0) return;
      void queryClient.invalidateQueries({ queryKey: boardKeys.lists() });
    }, REFRESH_MS);
    return () => clearInterval(timer);
  }, [queryClient]);
  return useQuery(boardQueryOptions(filters));
}
