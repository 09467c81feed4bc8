import { Survey } from '@keybed/shared';
import type { QueryClient } from '@tanstack/react-query';
import { api, errorDetail } from '@/lib/api-client';
import type { SurveyWire } from '../lib/survey-answer';
import { surveyKeys } from './keys';

/** Particulars and summary; refused with 409 and the current survey when `version` is stale. */
export const updateSurvey = (surveyId: string, wire: SurveyWire, version: number) =>
  api.patch(`/surveys/${encodeURIComponent(surveyId)}`, { ...wire, version }, Survey);

export const conflictingSurvey = (error: unknown) => errorDetail(error, 'current', Survey);

export function cacheSurvey(queryClient: QueryClient, saved: Survey) {
  queryClient.setQueryData<Survey>(surveyKeys.detail(saved.id), saved);
  void queryClient.invalidateQueries({ queryKey: surveyKeys.list(saved.pianoId) });
}
