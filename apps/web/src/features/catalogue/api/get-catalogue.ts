import { queryOptions, useQuery } from '@tanstack/react-query';
import { CatalogueOperation } from '@keybed/shared';
import { api, field } from '@/lib/api-client';
import { catalogueKeys, type CatalogueFilters } from './keys';

export const getCatalogue = (filters: CatalogueFilters) =>
  api.get(`/catalogue${filters.includeInactive ? '?includeInactive=true' : ''}`, field('operations', CatalogueOperation.array()));

export const catalogueQueryOptions = (filters: CatalogueFilters = {}) =>
  queryOptions({ queryKey: catalogueKeys.list(filters), queryFn: () => getCatalogue(filters), placeholderData: (previous) => previous });

export const useCatalogue = (filters: CatalogueFilters = {}) => useQuery(catalogueQueryOptions(filters));
