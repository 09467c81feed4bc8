import { Estimate } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { useEstimateMutation } from './use-estimate-mutation';

export const issueEstimate = ({ estimateId }: { estimateId: string }) => api.post(`/estimates/${encodeURIComponent(estimateId)}/issue`, {}, Estimate);

/** Freezes a draft for the client. */
export const useIssueEstimate = (jobId: string) => useEstimateMutation(jobId, issueEstimate);
