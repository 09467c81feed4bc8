import { useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Button, ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { pianoQueryOptions, usePiano } from '@/features/pianos/api/get-piano';
import { PianoDetails } from '@/features/pianos/components/piano-details';
import { PianoForm } from '@/features/pianos/components/piano-form';
import { PianoJobs } from '@/features/pianos/components/piano-jobs';
import { PianoSurveys } from '@/features/surveys/components/piano-surveys';
import { pianoName } from '@/lib/piano';
import { canRunBoard } from '@/lib/roles';
import { showToast } from '@/lib/toast';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.id) void queryClient.prefetchQuery(pianoQueryOptions(params.id));
    return null;
  };

export function Component() {
  const { id = '' } = useParams();
  const me = useSignedInMember();
  const piano = usePiano(id);
  const [isEditing, setIsEditing] = useState(false);
  const canEdit = canRunBoard(me.role);

  if (piano.isPending) {
    return (
      <LoadingRegion label="Loading the piano">
        <Skeleton className="h-9 w-72 max-w-full" />
        <Skeleton className="mt-6 h-64 w-full" />
      </LoadingRegion>
    );
  }
  if (piano.isError) {
    return (
      <>
        <PageHeader title="Piano" />
        <ErrorState error={piano.error} onRetry={() => void piano.refetch()} isRetrying={piano.isFetching} />
      </>
    );
  }

  const data = piano.data;
  const name = pianoName(data);
  return (
    <>
      <title>{`${name} · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title={name}
        description={`${data.clientName}’s piano`}
        actions={
          isEditing ? undefined : (
            <>
              <ButtonLink to={paths.newSurvey.build(data.id)}>Start a survey</ButtonLink>
              {canEdit && (
                <>
                  <ButtonLink to={paths.newJob.build({ pianoId: data.id })} variant="secondary">Start a job</ButtonLink>
                  <Button variant="secondary" onClick={() => setIsEditing(true)}>Edit piano</Button>
                </>
              )}
            </>
          )
        }
      />
      <div className="grid gap-10 lg:grid-cols-2">
        <section aria-labelledby="piano-details-heading" className="space-y-3">
          <h2 id="piano-details-heading" className="text-lg font-semibold">{isEditing ? 'Edit details' : 'Details'}</h2>
          {isEditing ? (
            <PianoForm
              clientId={data.clientId}
              piano={data}
              onSaved={(saved) => {
                setIsEditing(false);
                showToast('success', `Saved ${pianoName(saved)}.`);
              }}
              onCancel={() => setIsEditing(false)}
            />
          ) : (
            <PianoDetails piano={data} />
          )}
        </section>
        <section aria-labelledby="piano-jobs-heading" className="space-y-3">
          <h2 id="piano-jobs-heading" className="text-lg font-semibold">Job history</h2>
          <PianoJobs piano={data} />
        </section>
        <section aria-labelledby="piano-surveys-heading" className="space-y-3 lg:col-span-2">
          <h2 id="piano-surveys-heading" className="text-lg font-semibold">Condition surveys</h2>
          <PianoSurveys pianoId={data.id} />
        </section>
      </div>
    </>
  );
}
