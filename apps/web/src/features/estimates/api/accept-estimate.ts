import { Estimate, type AcceptEstimateInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { useEstimateMutation } from './use-estimate-mutation';

export const acceptEstimate = ({ estimateId, input }: { estimateId: string; input: AcceptEstimateInput }) =>
  api.post(`/estimates/${encodeURIComponent(estimateId)}/accept`, input, Estimate);

/** Records the client's acceptance with one option of each choice; its labour becomes the tasks' budget. */
export const useAcceptEstimate = (jobId: string) => useEstimateMutation(jobId, acceptEstimate);
