import { ErrorState } from '@/components/error-state';
import { useInvitations } from '../api/get-invitations';
import { InvitationsList } from './invitations-list';
import { InviteForm } from './invite-form';
import { TeamSkeleton } from './team-skeleton';

export function InvitationsSection() {
  const invitations = useInvitations();
  return (
    <section aria-labelledby="invitations-heading" className="space-y-4">
      <div>
        <h2 id="invitations-heading" className="text-lg font-semibold">
          Invite someone
        </h2>
        <p className="text-graphite-600">They get an e-mail with a link to join. Links work once.</p>
      </div>
      <InviteForm />
      <h3 className="pt-2 font-semibold">Waiting to join</h3>
      {invitations.isPending ? (
        <TeamSkeleton rows={2} label="Loading invitations" />
      ) : invitations.isError ? (
        <ErrorState error={invitations.error} onRetry={() => void invitations.refetch()} isRetrying={invitations.isFetching} headingLevel="h4" />
      ) : (
        <InvitationsList invitations={invitations.data} />
      )}
    </section>
  );
}
