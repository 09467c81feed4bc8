import { and, asc, desc, eq, isNull, lt, or, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Database } from '@keybed/db/client';
import { clients, jobs, memberships, pianos, securityEvents, stages, tasks, users, wallDevices, workshops } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

const pairers = alias(users, 'pairers');

export function createWallRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async insertDevice(tx: Tx, values: { workshopId: string; name: string; tokenHash: string; pairedBy: string; createdAt: Date }) {
      const [row] = await tx.insert(wallDevices).values(values).returning({ id: wallDevices.id });
      return row!.id;
    },

    recordEvent: (tx: Tx, values: typeof securityEvents.$inferInsert) => tx.insert(securityEvents).values(values),

    /** The device holding this token hash, with its workshop. */
    async findByTokenHash(tokenHash: string) {
      const [row] = await db
        .select({ id: wallDevices.id, workshopId: wallDevices.workshopId, name: wallDevices.name, lastSeenAt: wallDevices.lastSeenAt, revokedAt: wallDevices.revokedAt })
        .from(wallDevices)
        .where(eq(wallDevices.tokenHash, tokenHash));
      return row;
    },

    /** Notes the device was seen, at most once per `everyMs` (one cheap update, not one per request). */
    touch: (id: string, at: Date, everyMs: number) =>
      db
        .update(wallDevices)
        .set({ lastSeenAt: at })
        .where(and(eq(wallDevices.id, id), or(isNull(wallDevices.lastSeenAt), lt(wallDevices.lastSeenAt, new Date(at.getTime() - everyMs))))),

    async pairing(workshopId: string, deviceId: string) {
      const [row] = await db
        .select({ device: { id: wallDevices.id, name: wallDevices.name }, workshop: { id: workshops.id, name: workshops.name, timeZone: workshops.timeZone } })
        .from(wallDevices)
        .innerJoin(workshops, eq(workshops.id, wallDevices.workshopId))
        .where(and(eq(wallDevices.workshopId, workshopId), eq(wallDevices.id, deviceId)));
      return row;
    },

    devices: (workshopId: string) =>
      db
        .select({
          id: wallDevices.id,
          name: wallDevices.name,
          pairedBy: { id: pairers.id, name: pairers.name },
          createdAt: wallDevices.createdAt,
          lastSeenAt: wallDevices.lastSeenAt,
          revokedAt: wallDevices.revokedAt,
        })
        .from(wallDevices)
        .leftJoin(pairers, eq(pairers.id, wallDevices.pairedBy))
        .where(eq(wallDevices.workshopId, workshopId))
        .orderBy(sql`${wallDevices.revokedAt} is not null`, desc(wallDevices.createdAt)),

    async revoke(tx: Tx, workshopId: string, id: string, by: string, at: Date) {
      const rows = await tx
        .update(wallDevices)
        .set({ revokedAt: at, revokedBy: by })
        .where(and(eq(wallDevices.workshopId, workshopId), eq(wallDevices.id, id), isNull(wallDevices.revokedAt)))
        .returning({ id: wallDevices.id });
      return rows.length > 0;
    },

    async deviceExists(workshopId: string, id: string) {
      const [row] = await db.select({ id: wallDevices.id }).from(wallDevices).where(and(eq(wallDevices.workshopId, workshopId), eq(wallDevices.id, id)));
      return Boolean(row);
    },

    /** Who appears on the wall: active technicians, and any other active member who has set a PIN. */
    wallPeople: (workshopId: string) =>
      db
        .select({ id: users.id, name: users.name, hasPin: sql<boolean>`${memberships.pinHash} is not null`, lockedUntil: memberships.pinLockedUntil })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.isActive, true), or(eq(memberships.role, 'technician'), sql`${memberships.pinHash} is not null`)))
        .orderBy(asc(users.name)),

    /**
     * Open tasks (not done) of active jobs, the technician's assigned ones first, then by job and
     * place in the job: one statement.
     */
    openTasks: (workshopId: string, technicianId: string) => {
      const isAssigned = sql<boolean>`exists (select 1 from task_assignees a where a.task_id = ${tasks.id} and a.user_id = ${technicianId})`;
      return db
        .select({
          id: tasks.id,
          title: tasks.title,
          status: tasks.status,
          isAssigned,
          job: { id: jobs.id, title: jobs.title, clientName: clients.name },
          piano: { maker: pianos.maker, model: pianos.model, type: pianos.type },
          stage: { id: stages.id, name: stages.name },
        })
        .from(tasks)
        .innerJoin(jobs, eq(jobs.id, tasks.jobId))
        .innerJoin(clients, eq(clients.id, jobs.clientId))
        .innerJoin(pianos, eq(pianos.id, jobs.pianoId))
        .leftJoin(stages, eq(stages.id, tasks.stageId))
        .where(and(eq(tasks.workshopId, workshopId), sql`${tasks.status} <> 'done'`, eq(jobs.status, 'active')))
        .orderBy(desc(isAssigned), asc(jobs.title), asc(jobs.id), asc(tasks.position))
        .limit(500);
    },
  };
}

export type WallRepo = ReturnType<typeof createWallRepo>;
