/** Filters of the parts list, as the API takes them. */
export interface PartFilters {
  q?: string;
  lowStock?: boolean;
  include?: 'active' | 'all';
}

/** Query keys for parts: lists by filter, one part with its ledger, and the parts used on each task. */
export const partKeys = {
  all: ['parts'] as const,
  lists: () => [...partKeys.all, 'list'] as const,
  list: (filters: PartFilters) => [...partKeys.lists(), filters] as const,
  details: () => [...partKeys.all, 'detail'] as const,
  detail: (id: string) => [...partKeys.details(), id] as const,
  usedOnTasks: () => [...partKeys.all, 'used-on-task'] as const,
  usedOnTask: (taskId: string) => [...partKeys.usedOnTasks(), taskId] as const,
};
