import { queryOptions, useQuery } from '@tanstack/react-query';
import { TaskTemplate } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { taskKeys } from './keys';

export const getTaskTemplate = (stageId: string) => api.get(`/stages/${encodeURIComponent(stageId)}/task-template`, TaskTemplate);

/** A stage's template tasks; a stage without a template has none. */
export const taskTemplateQueryOptions = (stageId: string) =>
  queryOptions({ queryKey: taskKeys.template(stageId), queryFn: () => getTaskTemplate(stageId), staleTime: 5 * 60_000 });

export const useTaskTemplate = (stageId: string | undefined) =>
  useQuery({ ...taskTemplateQueryOptions(stageId ?? ''), enabled: Boolean(stageId) });
