import { useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Button, ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { clientQueryOptions, useClient } from '@/features/clients/api/get-client';
import { ClientDetails } from '@/features/clients/components/client-details';
import { ClientForm } from '@/features/clients/components/client-form';
import { ClientPianos } from '@/features/clients/components/client-pianos';
import { canRunBoard } from '@/lib/roles';
import { showToast } from '@/lib/toast';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.id) void queryClient.prefetchQuery(clientQueryOptions(params.id));
    return null;
  };

export function Component() {
  const { id = '' } = useParams();
  const me = useSignedInMember();
  const client = useClient(id);
  const [isEditing, setIsEditing] = useState(false);
  const canEdit = canRunBoard(me.role);
  const back = <ButtonLink to={paths.clients.build()} variant="secondary">All clients</ButtonLink>;

  if (client.isPending) {
    return (
      <LoadingRegion label="Loading the client">
        <Skeleton className="h-9 w-72 max-w-full" />
        <Skeleton className="mt-6 h-48 w-full" />
      </LoadingRegion>
    );
  }
  if (client.isError) {
    return (
      <>
        <PageHeader title="Client" actions={back} />
        <ErrorState error={client.error} onRetry={() => void client.refetch()} isRetrying={client.isFetching} />
      </>
    );
  }

  const data = client.data;
  return (
    <>
      <title>{`${data.name} · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title={data.name}
        actions={
          <>
            {canEdit && !isEditing && <Button variant="secondary" onClick={() => setIsEditing(true)}>Edit client</Button>}
            {back}
          </>
        }
      />
      <div className="grid gap-10 lg:grid-cols-2">
        <section aria-labelledby="client-details-heading" className="space-y-3">
          <h2 id="client-details-heading" className="text-lg font-semibold">{isEditing ? 'Edit details' : 'Details'}</h2>
          {isEditing ? (
            <ClientForm
              client={data}
              onSaved={(saved) => {
                setIsEditing(false);
                showToast('success', `Saved ${saved.name}.`);
              }}
              onCancel={() => setIsEditing(false)}
            />
          ) : (
            <ClientDetails client={data} />
          )}
        </section>
        <section aria-labelledby="client-pianos-heading" className="space-y-3">
          <h2 id="client-pianos-heading" className="text-lg font-semibold">Pianos</h2>
          <ClientPianos client={data} canEdit={canEdit} />
        </section>
      </div>
    </>
  );
}
