import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { ROLE_LABELS, canManageTeam } from '@/lib/roles';

export function Component() {
  const me = useSignedInMember();
  const firstName = me.user.name.split(/\s+/)[0] ?? me.user.name;
  const isOwner = canManageTeam(me.role);

  return (
    <>
      <title>{`Home · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title={`Welcome, ${firstName}`}
        description={
          <>
            You are signed in to <strong className="text-ink">{me.workshop.name}</strong> as{' '}
            {ROLE_LABELS[me.role].toLowerCase()}.
          </>
        }
      />
      <EmptyState
        title="The job board arrives here"
        action={isOwner ? <ButtonLink to={paths.team.build()}>Invite your team</ButtonLink> : undefined}
      >
        <p>
          Soon this page shows every piano in the workshop, stage by stage from arrival to delivery, and who is
          working on what.
        </p>
        <p className="mt-2">
          {isOwner
            ? 'While it is on its way, invite your foreman and technicians so their accounts are ready.'
            : 'Until then there is nothing you need to do here.'}
        </p>
      </EmptyState>
    </>
  );
}
