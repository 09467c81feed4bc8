/** Query keys for estimates: each job's list of revisions (with what has been agreed). */
export const estimateKeys = {
  all: ['estimates'] as const,
  lists: () => [...estimateKeys.all, 'list'] as const,
  list: (jobId: string) => [...estimateKeys.lists(), { jobId }] as const,
};
