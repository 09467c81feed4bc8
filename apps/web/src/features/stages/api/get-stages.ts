import { queryOptions, useQuery } from '@tanstack/react-query';
import { Stage } from '@keybed/shared';
import { api, field } from '@/lib/api-client';
import { stageKeys } from './keys';

export const getStages = () => api.get('/stages', field('stages', Stage.array()));

export const stagesQueryOptions = () => queryOptions({ queryKey: stageKeys.list(), queryFn: getStages });

export const useStages = () => useQuery(stagesQueryOptions());
