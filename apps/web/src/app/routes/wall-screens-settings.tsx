import type { QueryClient } from '@tanstack/react-query';
import { ButtonLink } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { RegionBoundary } from '@/components/region-boundary';
import { paths } from '@/config/paths';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { techniciansQueryOptions } from '@/features/bench/api/get-technicians';
import { TechnicianPins } from '@/features/bench/components/technician-pins';
import { wallDevicesQueryOptions } from '@/features/wall/api/get-wall-devices';
import { WallDevices } from '@/features/wall/components/wall-devices';
import { canSetMemberPins, canSuperviseBench } from '@/lib/roles';
import { RunnersOnly } from '../layout/runners-only';

export const clientLoader = (queryClient: QueryClient) => () => {
  const me = queryClient.getQueryData(meQueryOptions().queryKey);
  if (me && canSuperviseBench(me.role)) {
    void queryClient.prefetchQuery(wallDevicesQueryOptions());
    void queryClient.prefetchQuery(techniciansQueryOptions());
  }
  return null;
};

export function Component() {
  const me = useSignedInMember();
  return (
    <>
      <title>{`Wall screen · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title="Wall screen"
        description="The shared touch screen where technicians clock on and off with their PINs."
        actions={canSuperviseBench(me.role) ? <ButtonLink to={paths.wallPair.build()}>Pair this browser</ButtonLink> : undefined}
      />
      <RunnersOnly role={me.role} what="manage the wall screen">
        <div className="grid gap-10 xl:grid-cols-2">
          <section aria-labelledby="screens-heading" className="space-y-3">
            <h2 id="screens-heading" className="text-lg font-semibold">Paired screens</h2>
            <RegionBoundary>
              <WallDevices />
            </RegionBoundary>
          </section>
          <section aria-labelledby="pins-heading" className="space-y-3">
            <h2 id="pins-heading" className="text-lg font-semibold">PINs</h2>
            <p className="text-graphite-600">
              Five wrong PINs in a row lock a person out of the wall for five minutes. Unlock them here.
              {canSetMemberPins(me.role) ? ' As the owner you can also set a PIN for someone who has forgotten theirs.' : ''}
            </p>
            <RegionBoundary>
              <TechnicianPins canSetPins={canSetMemberPins(me.role)} />
            </RegionBoundary>
          </section>
        </div>
      </RunnersOnly>
    </>
  );
}
