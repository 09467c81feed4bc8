import { queryOptions, useQuery } from '@tanstack/react-query';
import { CostRateList } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { settingsKeys } from './keys';

export const getCostRates = (membershipId: string) => api.get(`/team/members/${encodeURIComponent(membershipId)}/cost-rates`, CostRateList);

/** One member's cost rates, newest first, with the rate in force today (owner only). */
export const costRatesQueryOptions = (membershipId: string) =>
  queryOptions({ queryKey: settingsKeys.costRates(membershipId), queryFn: () => getCostRates(membershipId) });

export const useCostRates = (membershipId: string) => useQuery(costRatesQueryOptions(membershipId));
