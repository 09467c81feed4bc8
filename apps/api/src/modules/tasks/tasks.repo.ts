import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { jobs, memberships, stages, taskAssignees, tasks } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;
type TaskValues = typeof tasks.$inferInsert;

/** Assigned technicians of the task in the outer query, by name, as a JSON array. */
const assigneesOf = sql<Array<{ id: string; name: string }>>`coalesce((
  select json_agg(json_build_object('id', u.id, 'name', u.name) order by u.name, u.id)
  from task_assignees a join users u on u.id = a.user_id
  where a.task_id = ${tasks.id}), '[]'::json)`;

/** Whole minutes recorded on the task in the outer query, running entries up to `now`. */
const loggedMinutesOf = (now: Date) => sql<number>`coalesce((
  select sum(floor(extract(epoch from coalesce(e.ended_at, ${now.toISOString()}::timestamptz) - e.started_at) / 60))::int
  from time_entries e where e.task_id = ${tasks.id}), 0)`;

const selectTasks = (q: Db, now: Date) =>
  q
    .select({
      id: tasks.id,
      jobId: tasks.jobId,
      stage: { id: stages.id, name: stages.name },
      title: tasks.title,
      status: tasks.status,
      estimatedMinutes: tasks.estimatedMinutes,
      loggedMinutes: loggedMinutesOf(now),
      position: tasks.position,
      version: tasks.version,
      assignees: assigneesOf,
      createdAt: tasks.createdAt,
      updatedAt: tasks.updatedAt,
    })
    .from(tasks)
    .leftJoin(stages, eq(stages.id, tasks.stageId));

export type TaskRow = Awaited<ReturnType<ReturnType<typeof selectTasks>['execute']>>[number];

export function createTasksRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    /** A job's tasks in order, each with its stage, assignees and logged minutes: one statement. */
    listForJob: (workshopId: string, jobId: string, now: Date, q: Db = db) =>
      selectTasks(q, now)
        .where(and(eq(tasks.workshopId, workshopId), eq(tasks.jobId, jobId)))
        .orderBy(asc(tasks.position)),

    async find(workshopId: string, id: string, now: Date, q: Db = db): Promise<TaskRow | undefined> {
      const [row] = await selectTasks(q, now).where(and(eq(tasks.workshopId, workshopId), eq(tasks.id, id)));
      return row;
    },

    findMany: (workshopId: string, ids: string[], now: Date, q: Db = db) =>
      ids.length === 0
        ? Promise.resolve([] as TaskRow[])
        : selectTasks(q, now)
            .where(and(eq(tasks.workshopId, workshopId), inArray(tasks.id, ids)))
            .orderBy(asc(tasks.position)),

    async jobExists(workshopId: string, jobId: string, q: Db = db) {
      const [row] = await q.select({ id: jobs.id }).from(jobs).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, jobId)));
      return Boolean(row);
    },

    /** The job row, locked: every write to a job's task list holds it, so positions stay 0..n-1. */
    async lockJob(tx: Tx, workshopId: string, jobId: string) {
      const [row] = await tx
        .select({ id: jobs.id, status: jobs.status })
        .from(jobs)
        .where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, jobId)))
        .for('update');
      return row;
    },

    /** A task's job without locking, to learn which job to lock first. */
    async peekJob(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx.select({ jobId: tasks.jobId }).from(tasks).where(and(eq(tasks.workshopId, workshopId), eq(tasks.id, id)));
      return row?.jobId;
    },

    async lock(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx
        .select({ id: tasks.id, jobId: tasks.jobId, status: tasks.status, version: tasks.version, position: tasks.position, stageId: tasks.stageId })
        .from(tasks)
        .where(and(eq(tasks.workshopId, workshopId), eq(tasks.id, id)))
        .for('update');
      return row;
    },

    /** Ids of the job's tasks in position order. */
    async orderedIds(tx: Tx, jobId: string) {
      const rows = await tx.select({ id: tasks.id }).from(tasks).where(eq(tasks.jobId, jobId)).orderBy(asc(tasks.position));
      return rows.map((r) => r.id);
    },

    /** Titles (lower-cased) the job already has in a stage. */
    async titlesInStage(tx: Tx, jobId: string, stageId: string) {
      const rows = await tx
        .select({ title: sql<string>`lower(${tasks.title})` })
        .from(tasks)
        .where(and(eq(tasks.jobId, jobId), eq(tasks.stageId, stageId)));
      return new Set(rows.map((r) => r.title));
    },

    /** A stage by id in any workshop, so callers can tell "no such stage" from "not yours". */
    async findStage(q: Db, stageId: string) {
      const [row] = await q.select({ workshopId: stages.workshopId, name: stages.name }).from(stages).where(eq(stages.id, stageId));
      return row;
    },

    /** Which of these user ids are active members of the workshop. */
    async activeMemberIds(q: Db, workshopId: string, userIds: string[]) {
      if (userIds.length === 0) return new Set<string>();
      const rows = await q
        .select({ userId: memberships.userId })
        .from(memberships)
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.isActive, true), inArray(memberships.userId, userIds)));
      return new Set(rows.map((r) => r.userId));
    },

    async isAssigned(q: Db, taskId: string, userId: string) {
      const [row] = await q
        .select({ taskId: taskAssignees.taskId })
        .from(taskAssignees)
        .where(and(eq(taskAssignees.taskId, taskId), eq(taskAssignees.userId, userId)));
      return Boolean(row);
    },

    /** Technicians clocked on to the task right now, by name. */
    async runningOn(q: Db, taskId: string) {
      const rows = await q.execute<{ name: string }>(sql`
        select u.name from time_entries e join users u on u.id = e.technician_id
        where e.task_id = ${taskId} and e.ended_at is null order by u.name`);
      return [...rows].map((r) => r.name);
    },

    async insert(tx: Tx, values: TaskValues) {
      const [row] = await tx.insert(tasks).values(values).returning({ id: tasks.id });
      return row!.id;
    },

    async insertMany(tx: Tx, values: TaskValues[]) {
      if (values.length === 0) return [];
      const rows = await tx.insert(tasks).values(values).returning({ id: tasks.id });
      return rows.map((r) => r.id);
    },

    /** Replaces a task's assignees. */
    async setAssignees(tx: Tx, workshopId: string, taskId: string, userIds: string[]) {
      await tx.delete(taskAssignees).where(eq(taskAssignees.taskId, taskId));
      if (userIds.length > 0) await tx.insert(taskAssignees).values(userIds.map((userId) => ({ workshopId, taskId, userId })));
    },

    /** Writes the changes and adds one to the version. */
    bump: (tx: Tx, id: string, values: Partial<TaskValues>, at: Date) =>
      tx
        .update(tasks)
        .set({ ...values, version: sql`${tasks.version} + 1`, updatedAt: at })
        .where(eq(tasks.id, id)),

    /** Writes positions 0..n-1 in the given order, touching only rows whose position changes. One statement. */
    renumber: (tx: Tx, jobId: string, orderedIds: string[]) =>
      tx.execute(sql`
        update tasks t set position = (o.ord - 1)::int
        from unnest(array[${sql.join(orderedIds.map((id) => sql`${id}::uuid`), sql`, `)}]) with ordinality as o(id, ord)
        where t.id = o.id and t.job_id = ${jobId} and t.position <> (o.ord - 1)::int`),

  };
}

export type TasksRepo = ReturnType<typeof createTasksRepo>;
