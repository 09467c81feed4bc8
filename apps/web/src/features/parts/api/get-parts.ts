import { queryOptions, useQuery } from '@tanstack/react-query';
import { PartList } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { partKeys, type PartFilters } from './keys';

export function getParts(filters: PartFilters) {
  const query = new URLSearchParams();
  if (filters.q) query.set('q', filters.q);
  if (filters.lowStock) query.set('lowStock', 'true');
  if (filters.include) query.set('include', filters.include);
  const search = query.toString();
  return api.get(search ? `/parts?${search}` : '/parts', PartList);
}

/** The catalogue with stock on hand; money fields only as the member's role may see them. */
export const partsQueryOptions = (filters: PartFilters = {}) =>
  queryOptions({ queryKey: partKeys.list(filters), queryFn: () => getParts(filters), placeholderData: (previous) => previous });

export const useParts = (filters: PartFilters = {}) => useQuery(partsQueryOptions(filters));

/** How many active parts are at or below their reorder level (the navigation's badge). */
export const useLowStockCount = () => useQuery({ ...partsQueryOptions({}), select: (data) => data.lowStockCount });
