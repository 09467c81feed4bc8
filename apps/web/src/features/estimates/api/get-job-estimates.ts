import { queryOptions, useQuery } from '@tanstack/react-query';
import { JobEstimates } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { estimateKeys } from './keys';

export const getJobEstimates = (jobId: string) => api.get(`/jobs/${encodeURIComponent(jobId)}/estimates`, JobEstimates);

/** Every revision of a job's estimate, oldest first; prices and costs only as the role may see them. */
export const jobEstimatesQueryOptions = (jobId: string) => queryOptions({ queryKey: estimateKeys.list(jobId), queryFn: () => getJobEstimates(jobId) });

export const useJobEstimates = (jobId: string) => useQuery(jobEstimatesQueryOptions(jobId));
