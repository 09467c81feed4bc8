import { Estimate } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { useEstimateMutation } from './use-estimate-mutation';

export const declineEstimate = ({ estimateId }: { estimateId: string }) => api.post(`/estimates/${encodeURIComponent(estimateId)}/decline`, {}, Estimate);

/** Records that the client turned an issued estimate down. */
export const useDeclineEstimate = (jobId: string) => useEstimateMutation(jobId, declineEstimate);
