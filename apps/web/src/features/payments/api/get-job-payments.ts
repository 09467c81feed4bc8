import { queryOptions, useQuery } from '@tanstack/react-query';
import { JobPayments } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { paymentKeys } from './keys';

export const getJobPayments = (jobId: string) => api.get(`/jobs/${encodeURIComponent(jobId)}/payments`, JobPayments);

/** Deposits paid, and any waiting for the card payment, on one job (owner and foreman). */
export const jobPaymentsQueryOptions = (jobId: string) => queryOptions({ queryKey: paymentKeys.job(jobId), queryFn: () => getJobPayments(jobId) });

export const useJobPayments = (jobId: string) => useQuery(jobPaymentsQueryOptions(jobId));
