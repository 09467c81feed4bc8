import { and, asc, eq, gt, isNull } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { invitations, memberships, users, workshops } from '@keybed/db/schema';
import type { Role } from '@keybed/shared';
import type { Tx } from '../auth/auth.repo';

const memberColumns = {
  id: memberships.id,
  userId: users.id,
  name: users.name,
  email: users.email,
  role: memberships.role,
  isActive: memberships.isActive,
  joinedAt: memberships.createdAt,
};

const pending = (now: Date) => and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, now));

export function createTeamRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    listMembers: (workshopId: string) =>
      db
        .select(memberColumns)
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(eq(memberships.workshopId, workshopId))
        .orderBy(asc(users.name)),

    async findMember(q: Database | Tx, workshopId: string, membershipId: string) {
      const [row] = await q
        .select(memberColumns)
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.id, membershipId)))
        .limit(1);
      return row;
    },

    /** Locks the workshop's owner memberships so two demotions cannot both pass the last-owner rule. */
    async lockActiveOwners(tx: Tx, workshopId: string) {
      return tx
        .select({ id: memberships.id })
        .from(memberships)
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.role, 'owner'), eq(memberships.isActive, true)))
        .for('update');
    },

    updateMember: (tx: Tx, membershipId: string, values: { role?: Role; isActive?: boolean }) =>
      tx.update(memberships).set(values).where(eq(memberships.id, membershipId)),

    listPendingInvitations: (workshopId: string, now: Date) =>
      db
        .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, createdAt: invitations.createdAt })
        .from(invitations)
        .where(and(eq(invitations.workshopId, workshopId), pending(now)))
        .orderBy(asc(invitations.createdAt)),

    async isActiveMemberEmail(workshopId: string, email: string) {
      const [row] = await db
        .select({ id: memberships.id })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.workshopId, workshopId), eq(users.email, email), eq(memberships.isActive, true)))
        .limit(1);
      return Boolean(row);
    },

    /** A new invitation replaces any pending one for the same address. */
    async replaceInvitation(tx: Tx, values: { workshopId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date }, now: Date) {
      await tx
        .update(invitations)
        .set({ revokedAt: now })
        .where(and(eq(invitations.workshopId, values.workshopId), eq(invitations.email, values.email), pending(now)));
      const [row] = await tx.insert(invitations).values(values).returning();
      return row!;
    },

    async revokeInvitation(workshopId: string, id: string, now: Date) {
      const rows = await db
        .update(invitations)
        .set({ revokedAt: now })
        .where(and(eq(invitations.workshopId, workshopId), eq(invitations.id, id), pending(now)))
        .returning({ id: invitations.id });
      return rows.length > 0;
    },

    /** A pending invitation by token hash; inside a transaction the row is locked. */
    async findUsableInvitation(tokenHash: string, now: Date, tx?: Tx) {
      const query = (tx ?? db)
        .select({ id: invitations.id, workshopId: invitations.workshopId, workshopName: workshops.name, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt })
        .from(invitations)
        .innerJoin(workshops, eq(workshops.id, invitations.workshopId))
        .where(and(eq(invitations.tokenHash, tokenHash), pending(now)))
        .limit(1);
      const [row] = tx ? await query.for('update', { of: invitations }) : await query;
      return row;
    },

    markAccepted: (tx: Tx, id: string, now: Date) => tx.update(invitations).set({ acceptedAt: now }).where(eq(invitations.id, id)),

    findUserByEmail: (tx: Tx, email: string) => tx.query.users.findFirst({ where: eq(users.email, email) }),

    async insertUser(tx: Tx, values: { email: string; name: string; passwordHash: string }) {
      const [row] = await tx.insert(users).values(values).returning({ id: users.id });
      return row!.id;
    },

    /** Adds the membership, or re-activates it with the invited role when it existed before. */
    upsertMembership: (tx: Tx, values: { workshopId: string; userId: string; role: Role }) =>
      tx
        .insert(memberships)
        .values(values)
        .onConflictDoUpdate({ target: [memberships.workshopId, memberships.userId], set: { role: values.role, isActive: true } }),

    findWorkshopName: async (workshopId: string) =>
      (await db.query.workshops.findFirst({ where: eq(workshops.id, workshopId), columns: { name: true } }))?.name,
  };
}

export type TeamRepo = ReturnType<typeof createTeamRepo>;
