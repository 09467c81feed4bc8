import { queryOptions, useQuery } from '@tanstack/react-query';
import { JobEstimates } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { surveyKeys } from './keys';

/** The revisions on the job prepared from a survey, to issue and send from the survey's side. */
export const getJobEstimates = (jobId: string) => api.get(`/jobs/${encodeURIComponent(jobId)}/estimates`, JobEstimates);

export const jobEstimatesQueryOptions = (jobId: string) =>
  queryOptions({ queryKey: surveyKeys.jobEstimates(jobId), queryFn: () => getJobEstimates(jobId) });

export const useJobEstimates = (jobId: string | null) => useQuery({ ...jobEstimatesQueryOptions(jobId ?? ''), enabled: jobId !== null });
