import { useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { ButtonLink } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { catalogueQueryOptions, useCatalogue } from '@/features/catalogue/api/get-catalogue';
import { CatalogueTable } from '@/features/catalogue/components/catalogue-table';
import { useWorkshopSettings } from '@/features/settings/api/get-settings';
import { RunnersOnly } from '../layout/runners-only';

export const clientLoader = (queryClient: QueryClient) => () => {
  void queryClient.prefetchQuery(catalogueQueryOptions({}));
  return null;
};

function CatalogueList() {
  const [isShowingAll, setIsShowingAll] = useState(false);
  const catalogue = useCatalogue({ includeInactive: isShowingAll });
  const settings = useWorkshopSettings();
  if (catalogue.isPending) {
    return (
      <LoadingRegion label="Loading the work catalogue">
        <Skeleton className="h-64 w-full" />
      </LoadingRegion>
    );
  }
  if (catalogue.isError) return <ErrorState error={catalogue.error} onRetry={() => void catalogue.refetch()} isRetrying={catalogue.isFetching} />;
  return (
    <div className="space-y-3">
      <Checkbox label="Show operations not in use" checked={isShowingAll} onChange={(e) => setIsShowingAll(e.target.checked)} />
      {catalogue.data.length === 0 ? (
        <EmptyState title="The catalogue is empty" action={<ButtonLink to={paths.newCatalogueOperation.build()}>Add an operation</ButtonLink>}>
          <p>Add the standard work you do (new hammers, rebushing, regulation…) with its usual tasks, hours and parts. Preparing an estimate from a survey proposes them.</p>
        </EmptyState>
      ) : (
        <CatalogueTable operations={catalogue.data} currency={settings.data?.currency ?? 'GBP'} />
      )}
    </div>
  );
}

export function Component() {
  const me = useSignedInMember();
  return (
    <>
      <title>{`Work catalogue · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title="Work catalogue"
        description="Standard operations with their usual tasks, hours, parts and work sent out."
        actions={<ButtonLink to={paths.newCatalogueOperation.build()}>Add an operation</ButtonLink>}
      />
      <RunnersOnly role={me.role} what="keep the work catalogue">
        <CatalogueList />
      </RunnersOnly>
    </>
  );
}
