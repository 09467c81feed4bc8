import type { QueryClient } from '@tanstack/react-query';
import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { RegionBoundary } from '@/components/region-boundary';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { settingsQueryOptions, useWorkshopSettings } from '@/features/settings/api/get-settings';
import { CostRates } from '@/features/settings/components/cost-rates';
import { WorkshopSettingsForm } from '@/features/settings/components/workshop-settings-form';
import { membersQueryOptions, useMembers } from '@/features/team/api/get-members';
import { canSeeCosts, ROLE_LABELS } from '@/lib/roles';

export const clientLoader = (queryClient: QueryClient) => () => {
  const me = queryClient.getQueryData(meQueryOptions().queryKey);
  if (!me || canSeeCosts(me.role)) {
    void queryClient.prefetchQuery(settingsQueryOptions());
    void queryClient.prefetchQuery(membersQueryOptions());
  }
  return null;
};

function CostRatesSection({ currency }: { currency: string }) {
  const members = useMembers();
  if (members.isPending) {
    return (
      <LoadingRegion label="Loading the team">
        <Skeleton className="h-40 w-full" />
      </LoadingRegion>
    );
  }
  if (members.isError) return <ErrorState error={members.error} headingLevel="h3" onRetry={() => void members.refetch()} isRetrying={members.isFetching} />;
  const order = { technician: 0, foreman: 1, owner: 2 } as const;
  const people = members.data
    .filter((m) => m.isActive)
    .sort((a, b) => order[a.role] - order[b.role] || a.name.localeCompare(b.name))
    .map((m) => ({ id: m.id, name: m.name, roleLabel: ROLE_LABELS[m.role] }));
  return <CostRates people={people} currency={currency} />;
}

function SettingsBody() {
  const settings = useWorkshopSettings();
  if (settings.isPending) {
    return (
      <LoadingRegion label="Loading the workshop settings">
        <Skeleton className="h-96 w-full max-w-3xl" />
      </LoadingRegion>
    );
  }
  if (settings.isError) return <ErrorState error={settings.error} onRetry={() => void settings.refetch()} isRetrying={settings.isFetching} />;
  return (
    <div className="max-w-4xl space-y-10">
      <RegionBoundary>
        <WorkshopSettingsForm settings={settings.data} />
      </RegionBoundary>
      <section aria-labelledby="cost-rates-heading" className="space-y-3">
        <h2 id="cost-rates-heading" className="text-lg font-semibold">Cost rates</h2>
        <RegionBoundary>
          <CostRatesSection currency={settings.data.currency} />
        </RegionBoundary>
      </section>
    </div>
  );
}

export function Component() {
  const me = useSignedInMember();
  return (
    <>
      <title>{`Workshop settings · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title="Workshop settings" description="Money, time and what each person’s hour costs the workshop." />
      {canSeeCosts(me.role) ? (
        <SettingsBody />
      ) : (
        <EmptyState title="Only the owner changes the workshop settings" action={<ButtonLink to={paths.board.build()} variant="secondary">Go to the board</ButtonLink>}>
          <p>Ask the owner if a rate or the working day needs changing.</p>
        </EmptyState>
      )}
    </>
  );
}
