import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { RegionBoundary } from '@/components/region-boundary';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { partQueryOptions, usePart } from '@/features/parts/api/get-part';
import { PartDetail } from '@/features/parts/components/part-detail';
import { settingsQueryOptions, useWorkshopSettings } from '@/features/settings/api/get-settings';
import { canRunBoard, canSeeCosts } from '@/lib/roles';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.id) void queryClient.prefetchQuery(partQueryOptions(params.id));
    void queryClient.prefetchQuery(settingsQueryOptions());
    return null;
  };

export function Component() {
  const { id = '' } = useParams();
  const me = useSignedInMember();
  const part = usePart(id);
  const settings = useWorkshopSettings();
  const back = <ButtonLink to={paths.parts.build()} variant="secondary">All parts</ButtonLink>;

  if (part.isPending || settings.isPending) {
    return (
      <LoadingRegion label="Loading the part">
        <Skeleton className="h-9 w-80 max-w-full" />
        <Skeleton className="mt-6 h-28 w-full" />
        <Skeleton className="mt-6 h-64 w-full" />
      </LoadingRegion>
    );
  }
  if (part.isError || settings.isError) {
    return (
      <>
        <title>Part · Keybed</title>
        <PageHeader title="Part" actions={back} />
        <ErrorState error={part.error ?? settings.error} onRetry={() => void (part.isError ? part.refetch() : settings.refetch())} isRetrying={part.isFetching || settings.isFetching} />
      </>
    );
  }
  return (
    <>
      <title>{`${part.data.name} · Parts · Keybed`}</title>
      <PageHeader
        title={part.data.name}
        description={`${part.data.sku} · sold by the ${part.data.unit}${part.data.isActive ? '' : ' · not in use'}`}
        actions={back}
      />
      <RegionBoundary>
        <PartDetail part={part.data} currency={settings.data.currency} canRecord={canRunBoard(me.role)} canEdit={canSeeCosts(me.role)} />
      </RegionBoundary>
    </>
  );
}
