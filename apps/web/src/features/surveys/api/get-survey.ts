import { queryOptions, useQuery } from '@tanstack/react-query';
import { Survey } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { keepSurveySnapshot } from '../lib/survey-snapshot';
import { surveyKeys } from './keys';

/** Each read is also kept on the device, so a reload without a connection can still open the survey. */
export async function getSurvey(id: string) {
  const survey = await api.get(`/surveys/${encodeURIComponent(id)}`, Survey);
  void keepSurveySnapshot(survey);
  return survey;
}

export const surveyQueryOptions = (id: string) => queryOptions({ queryKey: surveyKeys.detail(id), queryFn: () => getSurvey(id) });

export const useSurvey = (id: string) => useQuery(surveyQueryOptions(id));
