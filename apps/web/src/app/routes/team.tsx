import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { Member } from '@keybed/shared';
import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { invitationsQueryOptions } from '@/features/team/api/get-invitations';
import { membersQueryOptions } from '@/features/team/api/get-members';
import { InvitationsSection } from '@/features/team/components/invitations-section';
import { MembersSection } from '@/features/team/components/members-section';
import { canManageTeam } from '@/lib/roles';

export const clientLoader = (queryClient: QueryClient) => () => {
  const me = queryClient.getQueryData(meQueryOptions().queryKey);
  if (me && canManageTeam(me.role)) {
    void queryClient.prefetchQuery(membersQueryOptions());
    void queryClient.prefetchQuery(invitationsQueryOptions());
  }
  return null;
};

function OwnersOnly() {
  return (
    <EmptyState
      title="Only the workshop owner can manage the team"
      action={<ButtonLink to={paths.home.build()} variant="secondary">Go to home</ButtonLink>}
    >
      <p>Ask the owner if someone needs to join, change role or leave.</p>
    </EmptyState>
  );
}

export function Component() {
  const me = useSignedInMember();
  const queryClient = useQueryClient();

  // Your own role or access may have changed: refresh what the header and navigation show.
  const handleMemberUpdated = (member: Member) => {
    if (member.userId === me.user.id) void queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
  };

  const isOwner = canManageTeam(me.role);
  return (
    <>
      <title>{`Team · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title="Team"
        description={isOwner ? `Who works at ${me.workshop.name}, what each person may do, and who is invited.` : undefined}
      />
      {isOwner ? (
        <div className="grid gap-10 xl:grid-cols-[3fr_2fr]">
          <MembersSection currentUserId={me.user.id} onMemberUpdated={handleMemberUpdated} />
          <InvitationsSection />
        </div>
      ) : (
        <OwnersOnly />
      )}
    </>
  );
}
