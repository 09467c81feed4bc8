import type { AcceptInvitationInput, CreateInvitationInput, Invitation, InvitationPreview, Member, UpdateMemberInput } from '@keybed/shared';
import { AppError, notFound } from '../../http/errors';
import type { AuthContext } from '../../http/context';
import type { Mailer } from '../../lib/mail';
import { hashPassword, verifyPassword } from '../../lib/password';
import type { SessionStore } from '../../lib/sessions';
import { hashLinkToken, newLinkToken } from '../../lib/tokens';
import type { TeamRepo } from './team.repo';

const INVITATION_LIFETIME_MS = 7 * 24 * 3600_000;

interface Deps {
  repo: TeamRepo;
  sessions: SessionStore;
  mailer: Mailer;
  appOrigin: string;
  now: () => Date;
}

const invalidLink = () =>
  new AppError('token_invalid', 400, 'This invitation has expired, was withdrawn or was already used. Ask the workshop owner for a new one.');

const toMember = (m: Omit<Member, 'joinedAt'> & { joinedAt: Date }): Member => ({ ...m, joinedAt: m.joinedAt.toISOString() });
const toInvitation = (i: Omit<Invitation, 'expiresAt' | 'createdAt'> & { expiresAt: Date; createdAt: Date }): Invitation => ({
  id: i.id,
  email: i.email,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
  createdAt: i.createdAt.toISOString(),
});

export function createTeamService({ repo, sessions, mailer, appOrigin, now }: Deps) {
  return {
    listMembers: async (workshopId: string) => (await repo.listMembers(workshopId)).map(toMember),

    /** Role and active changes; a workshop always keeps at least one active owner. */
    async updateMember(auth: AuthContext, membershipId: string, input: UpdateMemberInput): Promise<Member> {
      const updated = await repo.transaction(async (tx) => {
        const owners = await repo.lockActiveOwners(tx, auth.workshopId);
        const member = await repo.findMember(tx, auth.workshopId, membershipId);
        if (!member) throw notFound('That member');
        const isOwnerNow = member.role === 'owner' && member.isActive;
        const staysOwner = (input.role ?? member.role) === 'owner' && (input.isActive ?? member.isActive);
        if (isOwnerNow && !staysOwner && owners.length <= 1) {
          throw new AppError('last_owner', 409, 'A workshop needs at least one active owner. Make someone else owner first.');
        }
        await repo.updateMember(tx, membershipId, input);
        return { ...member, ...input };
      });
      if (input.isActive === false) await sessions.endAllForMember(updated.userId, auth.workshopId);
      return toMember(updated);
    },

    listInvitations: async (workshopId: string) => (await repo.listPendingInvitations(workshopId, now())).map(toInvitation),

    async invite(auth: AuthContext, input: CreateInvitationInput): Promise<Invitation> {
      if (await repo.isActiveMemberEmail(auth.workshopId, input.email)) {
        throw new AppError('conflict', 409, 'This person is already a member of the workshop', { email: ['Already a member'] });
      }
      const { token, tokenHash } = newLinkToken();
      const at = now();
      const values = { workshopId: auth.workshopId, email: input.email, role: input.role, tokenHash, invitedBy: auth.userId, expiresAt: new Date(at.getTime() + INVITATION_LIFETIME_MS) };
      const invitation = await repo.transaction((tx) => repo.replaceInvitation(tx, values, at));
      const workshopName = (await repo.findWorkshopName(auth.workshopId)) ?? 'your workshop';
      await mailer.send({
        to: input.email,
        subject: `You are invited to ${workshopName} on Keybed`,
        text: `Hello,\n\n${workshopName} invites you to join its Keybed workshop as ${input.role}.\nOpen this link within 7 days to choose your name and password:\n\n${appOrigin}/invitations/${token}\n\nThe link works once. If you did not expect this, ignore the e-mail.\n`,
      });
      return toInvitation(invitation);
    },

    async revokeInvitation(workshopId: string, id: string) {
      if (!(await repo.revokeInvitation(workshopId, id, now()))) throw notFound('That invitation');
    },

    async previewInvitation(token: string): Promise<InvitationPreview> {
      const inv = await repo.findUsableInvitation(hashLinkToken(token), now());
      if (!inv) throw invalidLink();
      return { workshopName: inv.workshopName, email: inv.email, role: inv.role, expiresAt: inv.expiresAt.toISOString() };
    },

    /**
     * Creates the account (or, for an address that already has one, checks its password) and the
     * membership, once: the invitation row is locked and marked accepted in the same transaction.
     */
    async acceptInvitation(input: AcceptInvitationInput) {
      const newHash = await hashPassword(input.password);
      return repo.transaction(async (tx) => {
        const at = now();
        const inv = await repo.findUsableInvitation(hashLinkToken(input.token), at, tx);
        if (!inv) throw invalidLink();
        const existing = await repo.findUserByEmail(tx, inv.email);
        if (existing && !(await verifyPassword(existing.passwordHash, input.password))) {
          throw new AppError('email_taken', 409, 'This e-mail already has a Keybed account: enter that account’s password to join', {
            password: ['Enter the password of your existing Keybed account'],
          });
        }
        const userId = existing?.id ?? (await repo.insertUser(tx, { email: inv.email, name: input.name, passwordHash: newHash }));
        await repo.upsertMembership(tx, { workshopId: inv.workshopId, userId, role: inv.role });
        await repo.markAccepted(tx, inv.id, at);
        return { userId, workshopId: inv.workshopId };
      });
    },
  };
}

export type TeamService = ReturnType<typeof createTeamService>;
