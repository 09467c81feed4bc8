import { queryOptions, useQuery } from '@tanstack/react-query';
import { JobCosting } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { costingKeys } from './keys';

export const getJobCosting = (jobId: string) => api.get(`/jobs/${encodeURIComponent(jobId)}/costing`, JobCosting);

/** Hours and parts per task for everyone; money only in the owner's answer. */
export const jobCostingQueryOptions = (jobId: string) => queryOptions({ queryKey: costingKeys.job(jobId), queryFn: () => getJobCosting(jobId) });

export const useJobCosting = (jobId: string) => useQuery(jobCostingQueryOptions(jobId));
