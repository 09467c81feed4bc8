import type { z } from 'zod';
import { CreateEstimateInput, Estimate } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { useEstimateMutation } from './use-estimate-mutation';

/** What may be sent: title and notes default to empty. */
export type CreateEstimateBody = z.input<typeof CreateEstimateInput>;

export const createEstimate = ({ jobId, input }: { jobId: string; input: CreateEstimateBody }) =>
  api.post(`/jobs/${encodeURIComponent(jobId)}/estimates`, input, Estimate);

/** A new draft: the job's first estimate, a revision copied from another, or a variation once one is accepted. */
export const useCreateEstimate = (jobId: string) => useEstimateMutation(jobId, createEstimate);
