import { queryOptions, useQuery } from '@tanstack/react-query';
import { EstimateProposal } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { surveyKeys } from './keys';

export const getEstimateProposal = (surveyId: string) => api.get(`/surveys/${encodeURIComponent(surveyId)}/estimate-proposal`, EstimateProposal);

export const estimateProposalQueryOptions = (surveyId: string) =>
  queryOptions({ queryKey: surveyKeys.proposal(surveyId), queryFn: () => getEstimateProposal(surveyId), staleTime: 0 });

export const useEstimateProposal = (surveyId: string) => useQuery(estimateProposalQueryOptions(surveyId));
