import { queryOptions, useQuery } from '@tanstack/react-query';
import { MarginsReport } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { costingKeys, type MarginsFilters } from './keys';

function searchOf(filters: MarginsFilters, format?: 'csv') {
  const query = new URLSearchParams();
  if (filters.from) query.set('from', filters.from);
  if (filters.to) query.set('to', filters.to);
  if (filters.status) query.set('status', filters.status);
  if (format) query.set('format', format);
  const search = query.toString();
  return search ? `?${search}` : '';
}

export const getMargins = (filters: MarginsFilters) => api.get(`/reports/margins${searchOf(filters)}`, MarginsReport);

/** The same rows as a CSV file, downloaded by the browser with the member's session. */
export const marginsCsvUrl = (filters: MarginsFilters) => `/api/reports/margins${searchOf(filters, 'csv')}`;

/** The owner's margins for a period: one row per job, totals and utilisation. */
export const marginsQueryOptions = (filters: MarginsFilters) =>
  queryOptions({ queryKey: costingKeys.margins(filters), queryFn: () => getMargins(filters), placeholderData: (previous) => previous });

export const useMargins = (filters: MarginsFilters) => useQuery(marginsQueryOptions(filters));
