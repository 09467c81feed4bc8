import type { PartFilters } from '../api/keys';

/** Filters of the parts page, as its URL carries them (`?q=…&low=true&all=true`). */
export function partFiltersFrom(params: URLSearchParams): PartFilters {
  return {
    ...(params.get('q') ? { q: params.get('q')! } : {}),
    ...(params.get('low') === 'true' ? { lowStock: true } : {}),
    ...(params.get('all') === 'true' ? { include: 'all' as const } : {}),
  };
}
