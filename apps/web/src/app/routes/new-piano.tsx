import { useNavigate, useSearchParams } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { useClient } from '@/features/clients/api/get-client';
import { PianoForm } from '@/features/pianos/components/piano-form';
import { showToast } from '@/lib/toast';
import { RunnersOnly } from '../layout/runners-only';

function ForClient({ clientId }: { clientId: string }) {
  const navigate = useNavigate();
  const client = useClient(clientId);
  if (client.isPending) return <Skeleton className="h-96 w-full" />;
  if (client.isError) return <ErrorState error={client.error} onRetry={() => void client.refetch()} />;
  return (
    <div className="max-w-3xl space-y-4">
      <p className="text-graphite-600">
        Owner: <strong className="text-ink">{client.data.name}</strong>
      </p>
      <PianoForm
        clientId={clientId}
        onSaved={(piano) => {
          showToast('success', `${piano.maker} is added to ${client.data.name}’s pianos.`);
          void navigate(paths.piano.build(piano.id));
        }}
        onCancel={() => void navigate(paths.client.build(clientId))}
      />
    </div>
  );
}

export function Component() {
  const me = useSignedInMember();
  const [params] = useSearchParams();
  const clientId = params.get('clientId');
  return (
    <>
      <title>{`Add a piano · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title="Add a piano" />
      <RunnersOnly role={me.role} what="add pianos">
        {clientId ? (
          <ForClient clientId={clientId} />
        ) : (
          <EmptyState title="Choose the piano’s owner first" action={<ButtonLink to={paths.clients.build()}>Go to clients</ButtonLink>}>
            <p>Open the client’s page and add the piano from there.</p>
          </EmptyState>
        )}
      </RunnersOnly>
    </>
  );
}
