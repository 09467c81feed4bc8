import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SendEstimateResult, type SendEstimateInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { surveyKeys } from './keys';

interface SendEstimateVariables {
  estimateId: string;
  jobId: string;
  input: SendEstimateInput;
}

/** Issues the estimate if it is a draft, then e-mails the client their private link with the PDF. */
export const sendEstimate = ({ estimateId, input }: SendEstimateVariables) => api.post(`/estimates/${encodeURIComponent(estimateId)}/send`, input, SendEstimateResult);

export const estimatePdfUrl = (estimateId: string) => `/api/estimates/${encodeURIComponent(estimateId)}/pdf`;

export function useSendEstimate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendEstimate,
    meta: { handlesError: true },
    onSettled: (_result, _error, { jobId }) => queryClient.invalidateQueries({ queryKey: surveyKeys.jobEstimates(jobId) }),
  });
}
