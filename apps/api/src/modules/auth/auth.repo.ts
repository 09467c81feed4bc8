import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { memberships, passwordResets, stages, users, workshops } from '@keybed/db/schema';
import { DEFAULT_STAGE_NAMES, type Role } from '@keybed/shared';

export type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
type Db = Database | Tx;

export function createAuthRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    findUserByEmail: (email: string, q: Db = db) =>
      q.query.users.findFirst({ where: eq(users.email, email) }),

    async insertWorkshopWithOwner(tx: Tx, input: { workshopName: string; name: string; email: string; passwordHash: string }) {
      const [workshop] = await tx.insert(workshops).values({ name: input.workshopName }).returning({ id: workshops.id });
      const [user] = await tx
        .insert(users)
        .values({ email: input.email, name: input.name, passwordHash: input.passwordHash })
        .returning({ id: users.id });
      await tx.insert(memberships).values({ workshopId: workshop!.id, userId: user!.id, role: 'owner' });
      await tx.insert(stages).values(DEFAULT_STAGE_NAMES.map((name, position) => ({ workshopId: workshop!.id, name, position })));
      return { workshopId: workshop!.id, userId: user!.id };
    },

    /** The member's most recent active membership, used at sign-in. */
    async findActiveMembershipForUser(userId: string) {
      const [row] = await db
        .select({ workshopId: memberships.workshopId })
        .from(memberships)
        .where(and(eq(memberships.userId, userId), eq(memberships.isActive, true)))
        .orderBy(desc(memberships.createdAt))
        .limit(1);
      return row;
    },

    async findMe(userId: string, workshopId: string) {
      const [row] = await db
        .select({
          user: { id: users.id, email: users.email, name: users.name },
          workshop: { id: workshops.id, name: workshops.name },
          role: memberships.role,
        })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .innerJoin(workshops, eq(workshops.id, memberships.workshopId))
        .where(and(eq(memberships.userId, userId), eq(memberships.workshopId, workshopId)))
        .limit(1);
      return row;
    },

    insertPasswordReset: (values: { userId: string; tokenHash: string; expiresAt: Date }) =>
      db.insert(passwordResets).values(values),

    /** Locks a usable reset row so that two confirmations cannot both use it. */
    async claimPasswordReset(tx: Tx, tokenHash: string, now: Date) {
      const [row] = await tx
        .select({ id: passwordResets.id, userId: passwordResets.userId })
        .from(passwordResets)
        .where(and(eq(passwordResets.tokenHash, tokenHash), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)))
        .for('update')
        .limit(1);
      if (!row) return undefined;
      await tx.update(passwordResets).set({ usedAt: now }).where(eq(passwordResets.id, row.id));
      return row;
    },

    setPassword: (tx: Tx, userId: string, passwordHash: string) =>
      tx.update(users).set({ passwordHash }).where(eq(users.id, userId)),
  };
}

export type AuthRepo = ReturnType<typeof createAuthRepo>;
