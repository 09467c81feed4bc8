import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Survey, type CreateSurveyInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { surveyKeys } from './keys';

interface CreateSurveyVariables {
  pianoId: string;
  input: CreateSurveyInput;
}

export const createSurvey = ({ pianoId, input }: CreateSurveyVariables) => api.post(`/pianos/${encodeURIComponent(pianoId)}/surveys`, input, Survey);

export function useCreateSurvey() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSurvey,
    meta: { handlesError: true },
    onSuccess: (survey) => {
      queryClient.setQueryData(surveyKeys.detail(survey.id), survey);
      return queryClient.invalidateQueries({ queryKey: surveyKeys.list(survey.pianoId) });
    },
  });
}
