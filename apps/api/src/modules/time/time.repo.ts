import { and, asc, desc, eq, gt, inArray, isNull, lt, or, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Database } from '@keybed/db/client';
import { jobs, memberships, tasks, timeEntries, timeEntryCorrections, timesheetWeeks, users, workshops } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

export type Db = Database | Tx;
type EntryValues = typeof timeEntries.$inferInsert;

const technicians = alias(users, 'technicians');
const creators = alias(users, 'creators');

/** Entries with the names the wire shows: technician, task, job, creator. */
const selectEntries = (q: Db) =>
  q
    .select({
      id: timeEntries.id,
      technician: { id: technicians.id, name: technicians.name },
      task: { id: tasks.id, title: tasks.title },
      job: { id: jobs.id, title: jobs.title },
      startedAt: timeEntries.startedAt,
      endedAt: timeEntries.endedAt,
      source: timeEntries.source,
      createdBy: { id: creators.id, name: creators.name },
      needsReview: timeEntries.needsReview,
      reviewReason: timeEntries.reviewReason,
    })
    .from(timeEntries)
    .innerJoin(technicians, eq(technicians.id, timeEntries.technicianId))
    .innerJoin(tasks, eq(tasks.id, timeEntries.taskId))
    .innerJoin(jobs, eq(jobs.id, timeEntries.jobId))
    .leftJoin(creators, eq(creators.id, timeEntries.createdBy));

export type EntryRow = Awaited<ReturnType<ReturnType<typeof selectEntries>['execute']>>[number];

const oldTasks = alias(tasks, 'old_tasks');
const newTasks = alias(tasks, 'new_tasks');

/** Entries of the workshop overlapping [from, to); either bound may be open. */
export interface EntryFilter {
  technicianId?: string;
  jobId?: string;
  from?: Date;
  to?: Date;
  needsReview?: boolean;
  limit: number;
}

export function createTimeRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async workshopClock(workshopId: string, q: Db = db) {
      const [row] = await q.select({ timeZone: workshops.timeZone, benchDayClose: workshops.benchDayClose }).from(workshops).where(eq(workshops.id, workshopId));
      return row!;
    },

    /**
     * The technician's membership, locked. Every clock action and correction of one technician
     * holds this lock first, so they run one after another and cannot deadlock.
     */
    async lockTechnician(tx: Tx, workshopId: string, userId: string) {
      const [row] = await tx
        .select({ membershipId: memberships.id, isActive: memberships.isActive, name: users.name, timeZone: workshops.timeZone })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .innerJoin(workshops, eq(workshops.id, memberships.workshopId))
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.userId, userId)))
        .for('update', { of: memberships });
      return row;
    },

    async findMemberName(workshopId: string, userId: string, q: Db = db) {
      const [row] = await q
        .select({ name: users.name })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.userId, userId)));
      return row?.name;
    },

    async findByKey(tx: Tx, workshopId: string, key: string, kind: 'start' | 'stop') {
      const column = kind === 'start' ? timeEntries.idempotencyKey : timeEntries.stopIdempotencyKey;
      const [row] = await tx
        .select({ id: timeEntries.id, technicianId: timeEntries.technicianId, taskId: timeEntries.taskId, startedAt: timeEntries.startedAt })
        .from(timeEntries)
        .where(and(eq(timeEntries.workshopId, workshopId), eq(column, key)));
      return row;
    },

    /** The entry of the technician that ended exactly when `at` began (the one a clock-on stopped). */
    async findEndedAt(tx: Tx, workshopId: string, technicianId: string, at: Date) {
      const [row] = await tx
        .select({ id: timeEntries.id })
        .from(timeEntries)
        .where(and(eq(timeEntries.workshopId, workshopId), eq(timeEntries.technicianId, technicianId), eq(timeEntries.endedAt, at)));
      return row?.id;
    },

    async findRunning(q: Db, workshopId: string, technicianId: string) {
      const [row] = await q
        .select({ id: timeEntries.id, taskId: timeEntries.taskId, jobId: timeEntries.jobId, startedAt: timeEntries.startedAt })
        .from(timeEntries)
        .where(and(eq(timeEntries.workshopId, workshopId), eq(timeEntries.technicianId, technicianId), isNull(timeEntries.endedAt)));
      return row;
    },

    /**
     * The technician's latest entry. One technician's entries never overlap, so the one that
     * started last also reaches furthest: it is the running entry if one runs, and its end (or
     * start, while running) is the latest moment recorded for the technician.
     */
    async latestEntry(tx: Tx, workshopId: string, technicianId: string) {
      const [row] = await tx
        .select({ id: timeEntries.id, taskId: timeEntries.taskId, jobId: timeEntries.jobId, startedAt: timeEntries.startedAt, endedAt: timeEntries.endedAt })
        .from(timeEntries)
        .where(and(eq(timeEntries.workshopId, workshopId), eq(timeEntries.technicianId, technicianId)))
        .orderBy(desc(timeEntries.startedAt))
        .limit(1);
      return row;
    },

    /** The task with its job's status, the task row locked (so marking it done waits for us, and we for it). */
    async lockTask(tx: Tx, workshopId: string, taskId: string) {
      const [row] = await tx
        .select({ id: tasks.id, jobId: tasks.jobId, status: tasks.status, title: tasks.title, jobStatus: jobs.status, jobTitle: jobs.title })
        .from(tasks)
        .innerJoin(jobs, eq(jobs.id, tasks.jobId))
        .where(and(eq(tasks.workshopId, workshopId), eq(tasks.id, taskId)))
        .for('update', { of: tasks });
      return row;
    },

    async findTask(q: Db, workshopId: string, taskId: string) {
      const [row] = await q.select({ id: tasks.id, jobId: tasks.jobId }).from(tasks).where(and(eq(tasks.workshopId, workshopId), eq(tasks.id, taskId)));
      return row;
    },

    stop: (tx: Tx, id: string, at: Date, stopKey: string | null) =>
      tx.update(timeEntries).set({ endedAt: at, stopIdempotencyKey: stopKey, updatedAt: at }).where(eq(timeEntries.id, id)),

    async insert(tx: Tx, values: EntryValues) {
      const [row] = await tx.insert(timeEntries).values(values).returning({ id: timeEntries.id });
      return row!.id;
    },

    /** Marks a to-do task in progress; true when it changed. */
    async startTaskIfTodo(tx: Tx, taskId: string, at: Date) {
      const rows = await tx
        .update(tasks)
        .set({ status: 'in_progress', version: sql`${tasks.version} + 1`, updatedAt: at })
        .where(and(eq(tasks.id, taskId), eq(tasks.status, 'todo')))
        .returning({ id: tasks.id });
      return rows.length > 0;
    },

    entries: (workshopId: string, f: EntryFilter, q: Db = db) =>
      selectEntries(q)
        .where(
          and(
            eq(timeEntries.workshopId, workshopId),
            f.technicianId ? eq(timeEntries.technicianId, f.technicianId) : undefined,
            f.jobId ? eq(timeEntries.jobId, f.jobId) : undefined,
            f.needsReview === undefined ? undefined : eq(timeEntries.needsReview, f.needsReview),
            f.to ? lt(timeEntries.startedAt, f.to) : undefined,
            f.from ? or(isNull(timeEntries.endedAt), gt(timeEntries.endedAt, f.from)) : undefined,
          ),
        )
        .orderBy(desc(timeEntries.startedAt))
        .limit(f.limit),

    async entry(workshopId: string, id: string, q: Db = db): Promise<EntryRow | undefined> {
      const [row] = await selectEntries(q).where(and(eq(timeEntries.workshopId, workshopId), eq(timeEntries.id, id)));
      return row;
    },

    async entriesByIds(workshopId: string, ids: string[], q: Db = db) {
      if (ids.length === 0) return [];
      return selectEntries(q).where(and(eq(timeEntries.workshopId, workshopId), inArray(timeEntries.id, ids)));
    },

    /** Running entries of the workshop, longest-running first. */
    running: (workshopId: string, q: Db = db) =>
      selectEntries(q)
        .where(and(eq(timeEntries.workshopId, workshopId), isNull(timeEntries.endedAt)))
        .orderBy(asc(timeEntries.startedAt)),

    /** Corrections of the given entries, oldest first, with task titles and who made them. */
    async corrections(ids: string[], q: Db = db) {
      if (ids.length === 0) return [];
      return q
        .select({
          id: timeEntryCorrections.id,
          entryId: timeEntryCorrections.entryId,
          reason: timeEntryCorrections.reason,
          by: { id: users.id, name: users.name },
          at: timeEntryCorrections.at,
          oldStartedAt: timeEntryCorrections.oldStartedAt,
          oldEndedAt: timeEntryCorrections.oldEndedAt,
          oldTask: { id: oldTasks.id, title: oldTasks.title },
          newStartedAt: timeEntryCorrections.newStartedAt,
          newEndedAt: timeEntryCorrections.newEndedAt,
          newTask: { id: newTasks.id, title: newTasks.title },
        })
        .from(timeEntryCorrections)
        .innerJoin(oldTasks, eq(oldTasks.id, timeEntryCorrections.oldTaskId))
        .innerJoin(newTasks, eq(newTasks.id, timeEntryCorrections.newTaskId))
        .leftJoin(users, eq(users.id, timeEntryCorrections.byUserId))
        .where(inArray(timeEntryCorrections.entryId, ids))
        .orderBy(asc(timeEntryCorrections.at), asc(timeEntryCorrections.id));
    },

    /** Approved weeks (Monday dates) of the given technicians. */
    async approvedWeeks(workshopId: string, technicianIds: string[], q: Db = db) {
      if (technicianIds.length === 0) return [];
      return q
        .select({ technicianId: timesheetWeeks.technicianId, weekStart: timesheetWeeks.weekStart, by: { id: users.id, name: users.name }, at: timesheetWeeks.approvedAt })
        .from(timesheetWeeks)
        .leftJoin(users, eq(users.id, timesheetWeeks.approvedBy))
        .where(and(eq(timesheetWeeks.workshopId, workshopId), inArray(timesheetWeeks.technicianId, technicianIds)));
    },

    /** Approvals of the technician's weeks among `weekStarts`. */
    async approvalsOf(workshopId: string, technicianId: string, weekStarts: string[], q: Db = db) {
      if (weekStarts.length === 0) return [];
      return q
        .select({ weekStart: timesheetWeeks.weekStart, by: { id: users.id, name: users.name }, at: timesheetWeeks.approvedAt })
        .from(timesheetWeeks)
        .leftJoin(users, eq(users.id, timesheetWeeks.approvedBy))
        .where(and(eq(timesheetWeeks.workshopId, workshopId), eq(timesheetWeeks.technicianId, technicianId), inArray(timesheetWeeks.weekStart, weekStarts)))
        .orderBy(asc(timesheetWeeks.weekStart));
    },

    async lockEntry(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx
        .select({ id: timeEntries.id, technicianId: timeEntries.technicianId, taskId: timeEntries.taskId, startedAt: timeEntries.startedAt, endedAt: timeEntries.endedAt })
        .from(timeEntries)
        .where(and(eq(timeEntries.workshopId, workshopId), eq(timeEntries.id, id)))
        .for('update');
      return row;
    },

    async peekEntryTechnician(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx.select({ technicianId: timeEntries.technicianId }).from(timeEntries).where(and(eq(timeEntries.workshopId, workshopId), eq(timeEntries.id, id)));
      return row?.technicianId;
    },

    update: (tx: Tx, id: string, values: Partial<EntryValues>) => tx.update(timeEntries).set(values).where(eq(timeEntries.id, id)),

    /**
     * Records a correction at the database's clock: corrections of one entry are serialized by the
     * entry's row lock, so their times strictly increase and the trail reads in the order they were made.
     */
    insertCorrection: (tx: Tx, values: Omit<typeof timeEntryCorrections.$inferInsert, 'at'>) =>
      tx.insert(timeEntryCorrections).values({ ...values, at: sql`clock_timestamp()` }),

    async insertApproval(tx: Tx, values: { workshopId: string; technicianId: string; weekStart: string; approvedBy: string; approvedAt: Date }) {
      await tx.insert(timesheetWeeks).values(values).onConflictDoNothing();
    },

    /** Whether an entry of the technician that started before `to` is still running. */
    async hasRunningBefore(tx: Tx, workshopId: string, technicianId: string, to: Date) {
      const [row] = await tx
        .select({ id: timeEntries.id })
        .from(timeEntries)
        .where(and(eq(timeEntries.workshopId, workshopId), eq(timeEntries.technicianId, technicianId), isNull(timeEntries.endedAt), lt(timeEntries.startedAt, to)))
        .limit(1);
      return Boolean(row);
    },

    /** Every running entry in every workshop, with the workshop's clock: the bench-day close sweep's input. */
    runningEverywhere: (q: Db = db) =>
      q
        .select({ id: timeEntries.id, workshopId: timeEntries.workshopId, technicianId: timeEntries.technicianId, startedAt: timeEntries.startedAt, timeZone: workshops.timeZone, benchDayClose: workshops.benchDayClose })
        .from(timeEntries)
        .innerJoin(workshops, eq(workshops.id, timeEntries.workshopId))
        .where(isNull(timeEntries.endedAt)),

    /** Stops an entry that is still running and flags it; false when it was stopped meanwhile. */
    async closeForReview(tx: Tx, id: string, at: Date, reason: string) {
      const rows = await tx
        .update(timeEntries)
        .set({ endedAt: at, needsReview: true, reviewReason: reason, updatedAt: at })
        .where(and(eq(timeEntries.id, id), isNull(timeEntries.endedAt)))
        .returning({ id: timeEntries.id });
      return rows.length > 0;
    },
  };
}

export type TimeRepo = ReturnType<typeof createTimeRepo>;
