import { useEffect, useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import type { Survey } from '@keybed/shared';
import { ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { useTechnicians } from '@/features/bench/api/get-technicians';
import { surveyQueryOptions, useSurvey } from '@/features/surveys/api/get-survey';
import { SurveyScreen } from '@/features/surveys/components/survey-screen';
import { readSurveySnapshot } from '@/features/surveys/lib/survey-snapshot';
import { isApiError } from '@/lib/api-client';
import { formatDay } from '@/lib/format';
import { useLengthUnit } from '@/lib/length-unit';
import { pianoName } from '@/lib/piano';
import { canRunBoard } from '@/lib/roles';
export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.id) void queryClient.prefetchQuery(surveyQueryOptions(params.id));
    return null;
  };

/** Without a connection, the copy this device kept from its last visit (answers kept as drafts go on top). */
function useOfflineCopy(id: string, isUnreachable: boolean): Survey | null | undefined {
  const [copy, setCopy] = useState<Survey | null | undefined>(undefined);
  useEffect(() => {
    if (!isUnreachable) return;
    let isCurrent = true;
    void readSurveySnapshot(id).then((s) => isCurrent && setCopy(s));
    return () => {
      isCurrent = false;
    };
  }, [id, isUnreachable]);
  return copy;
}

export function Component() {
  const { id = '' } = useParams();
  const me = useSignedInMember();
  const survey = useSurvey(id);
  const people = useTechnicians();
  const unit = useLengthUnit();
  // The browser says it is offline (the query then waits, paused), or the API could not be reached.
  const isUnreachable =
    (survey.isPending && survey.fetchStatus === 'paused') ||
    (survey.isError && isApiError(survey.error) && ['network_error', 'service_unavailable', 'internal'].includes(survey.error.code));
  const offlineCopy = useOfflineCopy(id, isUnreachable && !survey.data);
  const data = survey.data ?? offlineCopy ?? null;

  if (!data && (survey.isPending || (isUnreachable && offlineCopy === undefined))) {
    return (
      <LoadingRegion label="Loading the survey">
        <Skeleton className="h-9 w-80 max-w-full" />
        <Skeleton className="mt-6 h-96 w-full" />
      </LoadingRegion>
    );
  }
  if (!data) {
    return (
      <>
        <title>Survey · Keybed</title>
        <PageHeader title="Survey" />
        <ErrorState error={survey.error} onRetry={() => void survey.refetch()} isRetrying={survey.isFetching} />
      </>
    );
  }

  const name = pianoName(data.piano);
  const canPrepare = canRunBoard(me.role);
  return (
    <>
      <title>{`Survey of the ${name} · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title={`Survey of the ${name}`}
        description={`${data.client.name}’s piano · ${formatDay(data.surveyedOn)}${data.assessor ? ` · ${data.assessor.name}` : ''}`}
        actions={
          <>
            {canPrepare && <ButtonLink to={paths.surveyEstimate.build(data.id)}>Prepare the estimate</ButtonLink>}
            {data.jobId && <ButtonLink to={paths.job.build(data.jobId)} variant="secondary">Open the job</ButtonLink>}
            <ButtonLink to={paths.piano.build(data.pianoId)} variant="secondary">Back to the piano</ButtonLink>
          </>
        }
      />
      <SurveyScreen
        survey={data}
        people={(people.data ?? []).map((p) => ({ id: p.id, name: p.name }))}
        canShare={canRunBoard(me.role)}
        unit={unit}
        isOfflineCopy={!survey.data}
      />
    </>
  );
}
