import type { Member } from '@keybed/shared';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { useMembers } from '../api/get-members';
import { MembersTable } from './members-table';
import { TeamSkeleton } from './team-skeleton';

interface MembersSectionProps {
  currentUserId: string;
  onMemberUpdated?: (member: Member) => void;
}

export function MembersSection({ currentUserId, onMemberUpdated }: MembersSectionProps) {
  const members = useMembers();
  return (
    <section aria-labelledby="members-heading" className="space-y-3">
      <h2 id="members-heading" className="text-lg font-semibold">
        Members
      </h2>
      {members.isPending ? (
        <TeamSkeleton label="Loading members" />
      ) : members.isError ? (
        <ErrorState error={members.error} onRetry={() => void members.refetch()} isRetrying={members.isFetching} headingLevel="h3" />
      ) : members.data.length === 0 ? (
        <EmptyState title="No members to show" headingLevel="h3">
          <p>Invite your foreman and technicians below; they appear here once they join.</p>
        </EmptyState>
      ) : (
        <MembersTable members={members.data} currentUserId={currentUserId} onMemberUpdated={onMemberUpdated} />
      )}
    </section>
  );
}
