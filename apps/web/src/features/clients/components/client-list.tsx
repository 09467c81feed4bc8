import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { useClients } from '../api/get-clients';

interface ClientListProps {
  q: string;
  canEdit: boolean;
}

/** The workshop's clients matching a search, by name. */
export function ClientList({ q, canEdit }: ClientListProps) {
  const clients = useClients(q ? { q } : {});

  if (clients.isPending) {
    return (
      <LoadingRegion label="Loading clients">
        <div className="space-y-2">{[0, 1, 2, 3].map((i) => <Skeleton key={i} className="h-14 w-full" />)}</div>
      </LoadingRegion>
    );
  }
  if (clients.isError) return <ErrorState error={clients.error} onRetry={() => void clients.refetch()} isRetrying={clients.isFetching} />;
  if (clients.data.length === 0) {
    return q ? (
      <EmptyState title={`No clients match “${q}”`}>
        <p>Search by name or e-mail, or clear the search to see everyone.</p>
      </EmptyState>
    ) : (
      <EmptyState
        title="No clients yet"
        action={canEdit ? <ButtonLink to={paths.newClient.build()}>Add a client</ButtonLink> : undefined}
      >
        <p>Add the people and schools whose pianos come to the workshop; each job starts from one of their pianos.</p>
      </EmptyState>
    );
  }

  return (
    <ul aria-label="Clients" aria-busy={clients.isFetching || undefined} className="divide-y divide-graphite-200 rounded-lg border border-graphite-300 bg-white">
      {clients.data.map((client) => (
        <li key={client.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-3">
          <TextLink to={paths.client.build(client.id)}>{client.name}</TextLink>
          <span className="text-sm break-all text-graphite-600">{[client.email, client.phone].filter(Boolean).join(' · ')}</span>
        </li>
      ))}
    </ul>
  );
}
