import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SurveyEstimateResult, type CreateSurveyEstimateInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { surveyKeys } from './keys';

interface CreateSurveyEstimateVariables {
  surveyId: string;
  input: CreateSurveyEstimateInput;
}

export const createSurveyEstimate = ({ surveyId, input }: CreateSurveyEstimateVariables) =>
  api.post(`/surveys/${encodeURIComponent(surveyId)}/estimate`, input, SurveyEstimateResult);

/** The survey now points at its job; the job's estimates gain a draft. */
export function useCreateSurveyEstimate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSurveyEstimate,
    meta: { handlesError: true },
    onSuccess: (result, { surveyId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: surveyKeys.detail(surveyId) }),
        queryClient.invalidateQueries({ queryKey: surveyKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: surveyKeys.jobEstimates(result.jobId) }),
      ]),
  });
}
