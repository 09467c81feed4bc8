import { useState } from 'react';
import { useParams } from 'react-router-dom';
import type { SurveyEstimateResult } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { useWorkshopSettings } from '@/features/settings/api/get-settings';
import { useEstimateProposal } from '@/features/surveys/api/get-estimate-proposal';
import { useSurvey } from '@/features/surveys/api/get-survey';
import { JobEstimates } from '@/features/surveys/components/job-estimates';
import { ProposalForm } from '@/features/surveys/components/proposal-form';
import { formatDay } from '@/lib/format';
import { formatMinor } from '@/lib/money';
import { pianoName } from '@/lib/piano';
import { RunnersOnly } from '../layout/runners-only';

/** The owner or foreman turns a survey into a draft estimate on a new job, then issues and sends it. */
export function Component() {
  const { id = '' } = useParams();
  const me = useSignedInMember();
  const survey = useSurvey(id);
  const proposal = useEstimateProposal(id);
  const settings = useWorkshopSettings();
  const [created, setCreated] = useState<SurveyEstimateResult | null>(null);

  const title = 'Prepare the estimate';
  if (survey.isPending || proposal.isPending || settings.isPending) {
    return (
      <LoadingRegion label="Loading the survey’s findings and the work catalogue">
        <Skeleton className="h-9 w-80 max-w-full" />
        <Skeleton className="mt-6 h-96 w-full" />
      </LoadingRegion>
    );
  }
  const error = survey.error ?? proposal.error ?? settings.error;
  if (error || !survey.data || !proposal.data || !settings.data) {
    return (
      <>
        <PageHeader title={title} />
        <ErrorState error={error} onRetry={() => void Promise.all([survey.refetch(), proposal.refetch(), settings.refetch()])} />
      </>
    );
  }
  const data = survey.data;
  const jobId = created?.jobId ?? proposal.data.jobId;
  return (
    <>
      <title>{`${title} · ${pianoName(data.piano)} · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title={title}
        description={`From the survey of ${formatDay(data.surveyedOn)} · ${data.client.name}’s ${pianoName(data.piano)}`}
        actions={<ButtonLink to={paths.survey.build(id)} variant="secondary">Back to the survey</ButtonLink>}
      />
      <RunnersOnly role={me.role} what="prepare estimates">
        <div className="space-y-8">
          {created && (
            <Alert tone="success" title={`Draft estimate created: revision ${created.estimate.revision}.`}>
              <p>
                {created.estimate.totals ? `${formatMinor(created.estimate.totals.grossMinor, created.estimate.currency)} with VAT. ` : ''}
                Edit it on the job if needed, then issue and send it below.
              </p>
            </Alert>
          )}
          {jobId && (
            <section aria-labelledby="job-estimates-heading" className="space-y-3">
              <h2 id="job-estimates-heading" className="text-xl font-bold">Estimates on the job</h2>
              <JobEstimates jobId={jobId} clientName={data.client.name} />
            </section>
          )}
          {!created && (
            <ProposalForm
              proposal={proposal.data}
              currency={settings.data.currency}
              onCreated={(result) => {
                setCreated(result);
                window.scrollTo({ top: 0 });
              }}
            />
          )}
        </div>
      </RunnersOnly>
    </>
  );
}
