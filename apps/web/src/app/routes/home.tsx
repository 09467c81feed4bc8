import { ButtonLink } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { ROLE_LABELS, canManageTeam, canRunBoard } from '@/lib/roles';

export function Component() {
  const me = useSignedInMember();
  const firstName = me.user.name.split(/\s+/)[0] ?? me.user.name;
  const isRunner = canRunBoard(me.role);

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
      <div className="rounded-lg border border-graphite-300 bg-white px-6 py-8">
        <h2 className="text-lg font-semibold">The board</h2>
        <p className="mt-1 max-w-prose text-graphite-600">
          Every piano in the workshop, stage by stage from intake to delivery: what is promised when, what is blocked, and
          who is on it. {isRunner ? 'Move cards as the work moves.' : 'It updates by itself as the work moves.'}
        </p>
        <div className="mt-5 flex flex-wrap gap-2">
          <ButtonLink to={paths.board.build()}>Open the board</ButtonLink>
          {isRunner && (
            <ButtonLink to={paths.newJob.build()} variant="secondary">
              Start a job
            </ButtonLink>
          )}
          <ButtonLink to={paths.clients.build()} variant="secondary">
            Clients
          </ButtonLink>
          {canManageTeam(me.role) && (
            <ButtonLink to={paths.team.build()} variant="secondary">
              Team
            </ButtonLink>
          )}
        </div>
      </div>
    </>
  );
}
