import type { Invitation } from '@keybed/shared';
import { EmptyState } from '@/components/empty-state';
import { InvitationRow } from './invitation-row';

export function InvitationsList({ invitations }: { invitations: Invitation[] }) {
  if (invitations.length === 0) {
    return (
      <EmptyState title="No invitations waiting" headingLevel="h4">
        <p>Invite your foreman and technicians with the form above. Each gets a link to join by e-mail.</p>
      </EmptyState>
    );
  }
  return (
    <ul aria-label="Pending invitations" className="rounded-lg border border-graphite-300 bg-white">
      {invitations.map((invitation) => (
        <InvitationRow key={invitation.id} invitation={invitation} />
      ))}
    </ul>
  );
}
