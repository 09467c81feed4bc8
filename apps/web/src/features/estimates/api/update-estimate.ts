import { Estimate, type UpdateEstimateInput } from '@keybed/shared';
import { api, errorDetail } from '@/lib/api-client';
import { useEstimateMutation } from './use-estimate-mutation';

export const updateEstimate = ({ estimateId, changes }: { estimateId: string; changes: UpdateEstimateInput }) =>
  api.patch(`/estimates/${encodeURIComponent(estimateId)}`, changes, Estimate);

/** The estimate as it is now, sent with a 409 when the edit was based on an older version. */
export const conflictingEstimate = (error: unknown) => errorDetail(error, 'current', Estimate);

/** Saves a draft's title, notes, options and lines (each list replaced whole), against its version. */
export const useUpdateEstimate = (jobId: string) => useEstimateMutation(jobId, updateEstimate);
