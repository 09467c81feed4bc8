import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { partsQueryOptions } from '@/features/parts/api/get-parts';
import { PartsScreen } from '@/features/parts/components/parts-screen';
import { partFiltersFrom } from '@/features/parts/lib/part-filters';
import { settingsQueryOptions, useWorkshopSettings } from '@/features/settings/api/get-settings';
import { canSeeCosts } from '@/lib/roles';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(partsQueryOptions(partFiltersFrom(new URL(request.url).searchParams)));
    void queryClient.prefetchQuery(settingsQueryOptions());
    return null;
  };

export function Component() {
  const me = useSignedInMember();
  const settings = useWorkshopSettings();
  const isOwner = canSeeCosts(me.role);
  return (
    <>
      <title>{`Parts · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title="Parts"
        description="What the workshop keeps in stock. Stock on hand is the sum of every delivery, use, return and adjustment."
        actions={isOwner ? <ButtonLink to={paths.newPart.build()}>Add a part</ButtonLink> : undefined}
      />
      {settings.data ? (
        <PartsScreen currency={settings.data.currency} canManage={isOwner} />
      ) : settings.isError ? (
        <ErrorState error={settings.error} onRetry={() => void settings.refetch()} isRetrying={settings.isFetching} />
      ) : (
        <LoadingRegion label="Loading parts">
          <Skeleton className="h-72 w-full" />
        </LoadingRegion>
      )}
    </>
  );
}
