/** Query keys for surveys: a piano's list, one survey, its estimate proposal, and the estimates of the job it led to. */
export const surveyKeys = {
  all: ['surveys'] as const,
  lists: () => [...surveyKeys.all, 'list'] as const,
  list: (pianoId: string) => [...surveyKeys.lists(), { pianoId }] as const,
  details: () => [...surveyKeys.all, 'detail'] as const,
  detail: (id: string) => [...surveyKeys.details(), id] as const,
  proposal: (id: string) => [...surveyKeys.detail(id), 'estimate-proposal'] as const,
  jobEstimates: (jobId: string) => [...surveyKeys.all, 'job-estimates', jobId] as const,
};
