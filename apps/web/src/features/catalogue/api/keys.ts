/** Query keys for the work catalogue: lists by filter (inactive operations shown or not). */
export interface CatalogueFilters {
  includeInactive?: boolean;
}

export const catalogueKeys = {
  all: ['catalogue'] as const,
  lists: () => [...catalogueKeys.all, 'list'] as const,
  list: (filters: CatalogueFilters) => [...catalogueKeys.lists(), filters] as const,
};
