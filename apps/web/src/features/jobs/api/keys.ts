import type { JobStatus } from '@keybed/shared';

/** Query keys for jobs: lists by filter, and one job (with its stage history) per detail. */
export interface JobFilters {
  status?: JobStatus;
  pianoId?: string;
  clientId?: string;
  q?: string;
}

export const jobKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobKeys.all, 'list'] as const,
  list: (filters: JobFilters) => [...jobKeys.lists(), filters] as const,
  details: () => [...jobKeys.all, 'detail'] as const,
  detail: (id: string) => [...jobKeys.details(), id] as const,
};
