/** Query keys for money received from clients: each job's payments. */
export const paymentKeys = {
  all: ['payments'] as const,
  lists: () => [...paymentKeys.all, 'list'] as const,
  job: (jobId: string) => [...paymentKeys.lists(), jobId] as const,
};
