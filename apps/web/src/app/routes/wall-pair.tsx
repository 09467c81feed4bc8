import { PageHeader } from '@/components/page-header';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { PairWallForm } from '@/features/wall/components/pair-wall-form';
import { RunnersOnly } from '../layout/runners-only';

export function Component() {
  const me = useSignedInMember();
  return (
    <>
      <title>{`Pair the wall screen · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title="Pair this browser as the wall screen" />
      <RunnersOnly role={me.role} what="pair the wall screen">
        <PairWallForm workshopName={me.workshop.name} />
      </RunnersOnly>
    </>
  );
}
