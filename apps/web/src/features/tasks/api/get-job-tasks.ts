import { queryOptions, useQuery } from '@tanstack/react-query';
import { TaskList } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { taskKeys } from './keys';

export const getJobTasks = (jobId: string) => api.get(`/jobs/${encodeURIComponent(jobId)}/tasks`, TaskList);

/** A job's tasks in their order. */
export const jobTasksQueryOptions = (jobId: string) =>
  queryOptions({ queryKey: taskKeys.list(jobId), queryFn: () => getJobTasks(jobId), select: (data) => data.tasks });

export const useJobTasks = (jobId: string) => useQuery(jobTasksQueryOptions(jobId));
