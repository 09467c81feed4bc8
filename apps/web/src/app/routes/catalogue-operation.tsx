import { useNavigate, useParams } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { useCatalogue } from '@/features/catalogue/api/get-catalogue';
import { OperationForm } from '@/features/catalogue/components/operation-form';
import { useParts } from '@/features/parts/api/get-parts';
import { useWorkshopSettings } from '@/features/settings/api/get-settings';
import { ApiError } from '@/lib/api-client';
import { canSeeCosts } from '@/lib/roles';
import { showToast } from '@/lib/toast';
import { RunnersOnly } from '../layout/runners-only';

/** Add an operation (no id) or edit one: the form needs the parts catalogue and the workshop's currency. */
function OperationEditor({ operationId }: { operationId: string | null }) {
  const me = useSignedInMember();
  const navigate = useNavigate();
  const catalogue = useCatalogue({ includeInactive: true });
  const parts = useParts({ include: 'all' });
  const settings = useWorkshopSettings();
  if (catalogue.isPending || parts.isPending || settings.isPending) {
    return (
      <LoadingRegion label="Loading the operation">
        <Skeleton className="h-96 w-full max-w-4xl" />
      </LoadingRegion>
    );
  }
  const error = catalogue.error ?? parts.error ?? settings.error;
  if (error || !catalogue.data || !parts.data || !settings.data) return <ErrorState error={error} onRetry={() => void catalogue.refetch()} />;
  const operation = operationId ? catalogue.data.find((o) => o.id === operationId) : undefined;
  if (operationId && !operation) return <ErrorState error={new ApiError({ status: 404, code: 'not_found', message: 'No such operation' })} />;
  return (
    <OperationForm
      key={operation?.id ?? 'new'}
      operation={operation}
      parts={parts.data.parts.filter((p) => p.isActive || operation?.lines.some((l) => l.part?.id === p.id))}
      currency={settings.data.currency}
      canSeeCosts={canSeeCosts(me.role)}
      onSaved={(saved) => {
        showToast('success', `${saved.name} is saved in the catalogue.`);
        void navigate(paths.catalogue.build());
      }}
    />
  );
}

export function Component() {
  const { id } = useParams();
  const me = useSignedInMember();
  const title = id ? 'Edit an operation' : 'Add an operation';
  return (
    <>
      <title>{`${title} · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title={title} actions={<ButtonLink to={paths.catalogue.build()} variant="secondary">Back to the catalogue</ButtonLink>} />
      <RunnersOnly role={me.role} what="keep the work catalogue">
        <OperationEditor operationId={id ?? null} />
      </RunnersOnly>
    </>
  );
}
