import { PageHeader } from '@/components/page-header';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { StagesSettings } from '@/features/stages/components/stages-settings';
import { RunnersOnly } from '../layout/runners-only';

export function Component() {
  const me = useSignedInMember();
  return (
    <>
      <title>{`Stages · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title="Stages"
        description="The steps a piano goes through in your workshop: the board shows one column for each, in this order."
      />
      <RunnersOnly role={me.role} what="change the stages">
        <div className="max-w-4xl">
          <StagesSettings />
        </div>
      </RunnersOnly>
    </>
  );
}
