import type { JobStatus } from '@keybed/shared';

/** Filters of the margins report, as its URL carries them. */
export interface MarginsFilters {
  from?: string;
  to?: string;
  status?: JobStatus;
}

/** Query keys for costing: each job's costing, and the margins report by filter. */
export const costingKeys = {
  all: ['costing'] as const,
  details: () => [...costingKeys.all, 'detail'] as const,
  job: (jobId: string) => [...costingKeys.details(), jobId] as const,
  reports: () => [...costingKeys.all, 'report'] as const,
  margins: (filters: MarginsFilters) => [...costingKeys.reports(), 'margins', filters] as const,
};
