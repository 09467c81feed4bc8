import { queryOptions, useQuery } from '@tanstack/react-query';
import { PartDetail } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { partKeys } from './keys';

export const getPart = (id: string) => api.get(`/parts/${encodeURIComponent(id)}`, PartDetail);

/** One part with its stock ledger, newest movement first. */
export const partQueryOptions = (id: string) => queryOptions({ queryKey: partKeys.detail(id), queryFn: () => getPart(id) });

export const usePart = (id: string) => useQuery(partQueryOptions(id));
