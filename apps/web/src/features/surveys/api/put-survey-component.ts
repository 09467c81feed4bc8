import { SurveyComponent, type Survey } from '@keybed/shared';
import type { QueryClient } from '@tanstack/react-query';
import { api, errorDetail } from '@/lib/api-client';
import type { ComponentWire } from '../lib/component-answer';
import { surveyKeys } from './keys';

/** Replaces one component's answer; refused with 409 and the current answer when `version` is stale. */
export const putSurveyComponent = (surveyId: string, componentId: string, wire: ComponentWire, version: number) =>
  api.put(`/surveys/${encodeURIComponent(surveyId)}/components/${encodeURIComponent(componentId)}`, { ...wire, version }, SurveyComponent);

/** The component as the server holds it now, sent with a version conflict. */
export const conflictingComponent = (error: unknown) => errorDetail(error, 'current', SurveyComponent);

/** Puts a saved component into the cached survey (photos, version and who saved it come with it). */
export function cacheComponent(queryClient: QueryClient, surveyId: string, saved: SurveyComponent) {
  queryClient.setQueryData<Survey>(surveyKeys.detail(surveyId), (survey) =>
    survey && {
      ...survey,
      areas: survey.areas.map((area) => ({ ...area, components: area.components.map((c) => (c.id === saved.id ? saved : c)) })),
    },
  );
}
