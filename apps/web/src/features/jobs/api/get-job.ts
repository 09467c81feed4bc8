import { queryOptions, useQuery } from '@tanstack/react-query';
import { JobDetail } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { jobKeys } from './keys';

export const getJob = (id: string) => api.get(`/jobs/${encodeURIComponent(id)}`, JobDetail);

export const jobQueryOptions = (id: string) => queryOptions({ queryKey: jobKeys.detail(id), queryFn: () => getJob(id) });

export const useJob = (id: string) => useQuery(jobQueryOptions(id));
