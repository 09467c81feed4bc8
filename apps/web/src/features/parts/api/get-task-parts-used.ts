import { queryOptions, useQuery } from '@tanstack/react-query';
import { TaskPartsUsed } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { partKeys } from './keys';

export const getTaskPartsUsed = (taskId: string) => api.get(`/tasks/${encodeURIComponent(taskId)}/parts-used`, TaskPartsUsed);

/** The part movements of one task and the net quantity of each part. */
export const taskPartsUsedQueryOptions = (taskId: string) =>
  queryOptions({ queryKey: partKeys.usedOnTask(taskId), queryFn: () => getTaskPartsUsed(taskId) });

export const useTaskPartsUsed = (taskId: string) => useQuery(taskPartsUsedQueryOptions(taskId));
