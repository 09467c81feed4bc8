import { useNavigate } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { PartForm } from '@/features/parts/components/part-form';
import { useWorkshopSettings } from '@/features/settings/api/get-settings';
import { canSeeCosts } from '@/lib/roles';

export function Component() {
  const me = useSignedInMember();
  const settings = useWorkshopSettings();
  const navigate = useNavigate();
  const back = <ButtonLink to={paths.parts.build()} variant="secondary">All parts</ButtonLink>;
  return (
    <>
      <title>{`New part · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title="New part" description="Add something the workshop keeps in stock. Record its first delivery on the part’s page." actions={back} />
      {!canSeeCosts(me.role) ? (
        <EmptyState title="Only the owner adds parts to the catalogue">
          <p>Ask the owner to add it; you can record deliveries and use once it is there.</p>
        </EmptyState>
      ) : settings.isError ? (
        <ErrorState error={settings.error} onRetry={() => void settings.refetch()} isRetrying={settings.isFetching} />
      ) : settings.isPending ? (
        <LoadingRegion label="Loading">
          <Skeleton className="h-96 w-full max-w-3xl" />
        </LoadingRegion>
      ) : (
        <PartForm currency={settings.data.currency} onSaved={(part) => navigate(paths.part.build(part.id))} />
      )}
    </>
  );
}
