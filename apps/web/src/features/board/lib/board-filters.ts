import { Id } from '@keybed/shared';
import type { BoardFilters } from '../api/keys';

/** Filters from the board's URL; anything unreadable is left out rather than sent to the API. */
export function filtersFromSearch(params: URLSearchParams): BoardFilters {
  const filters: BoardFilters = {};
  const q = params.get('q')?.trim().slice(0, 200);
  if (q) filters.q = q;
  if (params.get('blocked') === 'true') filters.blocked = true;
  const technicianId = params.get('technicianId');
  if (technicianId && Id.safeParse(technicianId).success) filters.technicianId = technicianId;
  return filters;
}

/** The URL's search params with `changes` applied; an empty value removes the filter. */
export function withFilters(params: URLSearchParams, changes: { q?: string; blocked?: boolean; technicianId?: string }): URLSearchParams {
  const next = new URLSearchParams(params);
  const set = (key: string, value: string | undefined) => (value ? next.set(key, value) : next.delete(key));
  if ('q' in changes) set('q', changes.q?.trim());
  if ('blocked' in changes) set('blocked', changes.blocked ? 'true' : undefined);
  if ('technicianId' in changes) set('technicianId', changes.technicianId);
  return next;
}

export const hasFilters = (filters: BoardFilters) => Boolean(filters.q || filters.blocked || filters.technicianId);
