import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { marginsQueryOptions } from '@/features/costing/api/get-margins';
import { MarginsScreen } from '@/features/costing/components/margins-screen';
import { marginsFiltersFrom } from '@/features/costing/lib/margins-filters';
import { STATUS_LABELS } from '@/features/jobs/lib/job-labels';
import { canSeeCosts } from '@/lib/roles';
import type { LayoutHandle } from './app-layout';

export const handle: LayoutHandle = { isWide: true };

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) => {
    const me = queryClient.getQueryData(meQueryOptions().queryKey);
    if (!me || canSeeCosts(me.role)) void queryClient.prefetchQuery(marginsQueryOptions(marginsFiltersFrom(new URL(request.url).searchParams).filters));
    return null;
  };

const STATUS_OPTIONS = (Object.entries(STATUS_LABELS) as Array<[keyof typeof STATUS_LABELS, string]>).map(([value, label]) => ({ value, label }));

export function Component() {
  const me = useSignedInMember();
  return (
    <>
      <title>{`Margins · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title="Margins" description="Each job’s price against its cost so far and its forecast at completion. Jobs below the target margin or over their hours come first." />
      {canSeeCosts(me.role) ? (
        <MarginsScreen statusOptions={STATUS_OPTIONS} />
      ) : (
        <EmptyState title="Margins are for the owner" action={<ButtonLink to={paths.board.build()} variant="secondary">Go to the board</ButtonLink>}>
          <p>Hours against each job’s estimate show on its page and on the board.</p>
        </EmptyState>
      )}
    </>
  );
}
