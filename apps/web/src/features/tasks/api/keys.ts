/** Query keys for tasks: each job's list, and each stage's task template. */
export const taskKeys = {
  all: ['tasks'] as const,
  lists: () => [...taskKeys.all, 'list'] as const,
  list: (jobId: string) => [...taskKeys.lists(), { jobId }] as const,
  details: () => [...taskKeys.all, 'detail'] as const,
  templates: () => [...taskKeys.details(), 'template'] as const,
  template: (stageId: string) => [...taskKeys.templates(), stageId] as const,
};
