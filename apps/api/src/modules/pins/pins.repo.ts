import { and, asc, count, eq, gt, lte, min, sql, type SQL } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { memberships, securityEvents, users, wallClockGrants, wallDevices } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;
export type SecurityEventValues = typeof securityEvents.$inferInsert;

const memberPin = {
  membershipId: memberships.id,
  userId: memberships.userId,
  name: users.name,
  isActive: memberships.isActive,
  pinHash: memberships.pinHash,
  pinFailedCount: memberships.pinFailedCount,
  pinLockedUntil: memberships.pinLockedUntil,
};

export function createPinsRepo(db: Database) {
  async function member(q: Db, where: SQL, lock: boolean) {
    const query = q.select(memberPin).from(memberships).innerJoin(users, eq(users.id, memberships.userId)).where(where);
    const [row] = lock ? await query.for('update', { of: memberships }) : await query;
    return row;
  }

  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    /** A member by user id; inside a transaction the membership row is locked (PIN counters change under it). */
    memberByUser: (workshopId: string, userId: string, tx?: Tx) =>
      member(tx ?? db, and(eq(memberships.workshopId, workshopId), eq(memberships.userId, userId))!, Boolean(tx)),

    memberById: (workshopId: string, membershipId: string, tx?: Tx) =>
      member(tx ?? db, and(eq(memberships.workshopId, workshopId), eq(memberships.id, membershipId))!, Boolean(tx)),

    /** Active members, technicians first, then by name. */
    activeMembers: (workshopId: string) =>
      db
        .select({ ...memberPin, role: memberships.role })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.isActive, true)))
        .orderBy(sql`${memberships.role} <> 'technician'`, asc(users.name)),

    async passwordHash(userId: string) {
      const [row] = await db.select({ passwordHash: users.passwordHash }).from(users).where(eq(users.id, userId));
      return row?.passwordHash;
    },

    setPin: (tx: Tx, membershipId: string, pinHash: string, at: Date) =>
      tx.update(memberships).set({ pinHash, pinSetAt: at, pinFailedCount: 0, pinLockedUntil: null }).where(eq(memberships.id, membershipId)),

    setFailures: (tx: Tx, membershipId: string, pinFailedCount: number, pinLockedUntil: Date | null) =>
      tx.update(memberships).set({ pinFailedCount, pinLockedUntil }).where(eq(memberships.id, membershipId)),

    recordEvent: (tx: Tx, values: SecurityEventValues) => tx.insert(securityEvents).values(values),

    /** Locks the device row so that one screen's PIN checks run one after another (the hourly cap stays exact). */
    lockDevice: (tx: Tx, deviceId: string) => tx.select({ id: wallDevices.id }).from(wallDevices).where(eq(wallDevices.id, deviceId)).for('update'),

    /** Stores a clock grant (its token's hash only) and drops the technician's expired ones. */
    async insertGrant(tx: Tx, values: typeof wallClockGrants.$inferInsert) {
      await tx.delete(wallClockGrants).where(and(eq(wallClockGrants.workshopId, values.workshopId), eq(wallClockGrants.technicianId, values.technicianId), lte(wallClockGrants.expiresAt, values.issuedAt)));
      await tx.insert(wallClockGrants).values(values);
    },

    /** Ends every clock grant of the technician (their PIN changed or was locked). */
    deleteGrants: (tx: Tx, workshopId: string, technicianId: string) =>
      tx.delete(wallClockGrants).where(and(eq(wallClockGrants.workshopId, workshopId), eq(wallClockGrants.technicianId, technicianId))),

    /** The grant holding this token hash, with whether its screen is revoked. */
    async findGrant(tx: Tx, tokenHash: string) {
      const [row] = await tx
        .select({
          workshopId: wallClockGrants.workshopId,
          deviceId: wallClockGrants.deviceId,
          technicianId: wallClockGrants.technicianId,
          issuedAt: wallClockGrants.issuedAt,
          expiresAt: wallClockGrants.expiresAt,
          deviceRevokedAt: wallDevices.revokedAt,
        })
        .from(wallClockGrants)
        .innerJoin(wallDevices, and(eq(wallDevices.id, wallClockGrants.deviceId), eq(wallDevices.workshopId, wallClockGrants.workshopId)))
        .where(eq(wallClockGrants.tokenHash, tokenHash));
      return row;
    },

    /** Wrong PINs sent from a device since `since`, and the oldest of them. */
    async deviceFailuresSince(tx: Tx, deviceId: string, since: Date) {
      const [row] = await tx
        .select({ n: count(), oldest: min(securityEvents.at) })
        .from(securityEvents)
        .where(and(eq(securityEvents.deviceId, deviceId), eq(securityEvents.kind, 'pin_failed'), gt(securityEvents.at, since)));
      return { count: row?.n ?? 0, oldest: row?.oldest ? new Date(row.oldest) : null };
    },
  };
}

export type PinsRepo = ReturnType<typeof createPinsRepo>;
export type PinMember = NonNullable<Awaited<ReturnType<PinsRepo['memberByUser']>>>;
