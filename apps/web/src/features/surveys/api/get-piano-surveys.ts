import { queryOptions, useQuery } from '@tanstack/react-query';
import { SurveySummary } from '@keybed/shared';
import { api, field } from '@/lib/api-client';
import { surveyKeys } from './keys';

export const getPianoSurveys = (pianoId: string) => api.get(`/pianos/${encodeURIComponent(pianoId)}/surveys`, field('surveys', SurveySummary.array()));

export const pianoSurveysQueryOptions = (pianoId: string) =>
  queryOptions({ queryKey: surveyKeys.list(pianoId), queryFn: () => getPianoSurveys(pianoId) });

export const usePianoSurveys = (pianoId: string) => useQuery(pianoSurveysQueryOptions(pianoId));
