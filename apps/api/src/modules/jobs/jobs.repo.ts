import { and, asc, desc, eq, getTableColumns, ilike, inArray, isNotNull, ne, or, sql, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Database } from '@keybed/db/client';
import { clients, jobs, jobStageEvents, pianos, stages, users } from '@keybed/db/schema';
import type { JobListQuery } from '@keybed/shared';
import { containsPattern } from '../../lib/search';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;
type JobValues = typeof jobs.$inferInsert;

const jobColumns = {
  ...getTableColumns(jobs),
  client: { id: clients.id, name: clients.name },
  piano: {
    id: pianos.id,
    maker: pianos.maker,
    model: pianos.model,
    type: pianos.type,
    sizeMm: pianos.sizeMm,
    serialNumber: pianos.serialNumber,
    keytopMaterial: pianos.keytopMaterial,
  },
};

/** Jobs with the client and piano the card shows: one statement however many jobs. */
export function selectJobs(q: Db) {
  return q
    .select(jobColumns)
    .from(jobs)
    .innerJoin(clients, eq(clients.id, jobs.clientId))
    .innerJoin(pianos, eq(pianos.id, jobs.pianoId));
}

export type JobRow = Awaited<ReturnType<ReturnType<typeof selectJobs>['execute']>>[number];

/** Free-text search over the job title, the client's name and the piano's maker, model and serial. */
export function jobSearch(q: string): SQL {
  const pattern = containsPattern(q);
  return or(
    ilike(jobs.title, pattern),
    ilike(clients.name, pattern),
    ilike(pianos.maker, pattern),
    ilike(pianos.model, pattern),
    ilike(pianos.serialNumber, pattern),
  )!;
}

const fromStages = alias(stages, 'from_stages');

export function createJobsRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async find(workshopId: string, id: string, q: Db = db): Promise<JobRow | undefined> {
      const [row] = await selectJobs(q).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, id)));
      return row;
    },

    list: (workshopId: string, { status, pianoId, clientId, q, limit }: JobListQuery) =>
      selectJobs(db)
        .where(
          and(
            eq(jobs.workshopId, workshopId),
            status ? eq(jobs.status, status) : undefined,
            pianoId ? eq(jobs.pianoId, pianoId) : undefined,
            clientId ? eq(jobs.clientId, clientId) : undefined,
            q ? jobSearch(q) : undefined,
          ),
        )
        .orderBy(desc(jobs.updatedAt), desc(jobs.id))
        .limit(limit),

    /** What the job page adds to the card: contact details and more about the piano. */
    async findDetailExtras(workshopId: string, id: string) {
      const [row] = await db
        .select({ email: clients.email, phone: clients.phone, yearApprox: pianos.yearApprox, caseFinish: pianos.caseFinish })
        .from(jobs)
        .innerJoin(clients, eq(clients.id, jobs.clientId))
        .innerJoin(pianos, eq(pianos.id, jobs.pianoId))
        .where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, id)));
      return row;
    },

    /** Stage changes, oldest first, with stage names and who made them. */
    history: (workshopId: string, jobId: string) =>
      db
        .select({
          id: jobStageEvents.id,
          fromStage: { id: fromStages.id, name: fromStages.name },
          toStage: { id: stages.id, name: stages.name },
          by: { id: users.id, name: users.name },
          at: jobStageEvents.at,
        })
        .from(jobStageEvents)
        .innerJoin(stages, eq(stages.id, jobStageEvents.toStageId))
        .leftJoin(fromStages, eq(fromStages.id, jobStageEvents.fromStageId))
        .leftJoin(users, eq(users.id, jobStageEvents.byUserId))
        .where(and(eq(jobStageEvents.workshopId, workshopId), eq(jobStageEvents.jobId, jobId)))
        .orderBy(asc(jobStageEvents.at), asc(jobStageEvents.id)),

    /** The piano's owner, when the piano belongs to the workshop. */
    async findPianoClient(tx: Tx, workshopId: string, pianoId: string) {
      const [row] = await tx.select({ clientId: pianos.clientId }).from(pianos).where(and(eq(pianos.workshopId, workshopId), eq(pianos.id, pianoId)));
      return row?.clientId;
    },

    /** A stage by id in any workshop, so callers can tell "no such stage" from "not yours". */
    async findStageOwner(tx: Tx, stageId: string) {
      const [row] = await tx.select({ workshopId: stages.workshopId }).from(stages).where(eq(stages.id, stageId));
      return row?.workshopId;
    },

    /** The first active stage of the board, locked. */
    async lockFirstActiveStage(tx: Tx, workshopId: string) {
      const [row] = await tx
        .select({ id: stages.id, name: stages.name, archivedAt: stages.archivedAt })
        .from(stages)
        .where(and(eq(stages.workshopId, workshopId), sql`${stages.archivedAt} is null`))
        .orderBy(asc(stages.position))
        .limit(1)
        .for('update');
      return row;
    },

    /**
     * Locks stage rows in id order. Every write that changes positions in a stage holds that
     * stage's lock first, so moves into one stage run one after another and cannot deadlock.
     */
    lockStages: (tx: Tx, workshopId: string, ids: string[]) =>
      tx
        .select({ id: stages.id, name: stages.name, archivedAt: stages.archivedAt })
        .from(stages)
        .where(and(eq(stages.workshopId, workshopId), inArray(stages.id, ids)))
        .orderBy(asc(stages.id))
        .for('update'),

    /** A job's place and version without locking, to learn which stage to lock first. */
    async peek(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx.select({ stageId: jobs.stageId }).from(jobs).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, id)));
      return row;
    },

    /** The job row, locked; taken only after its stage's lock. */
    async lock(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx
        .select({
          stageId: jobs.stageId,
          position: jobs.position,
          status: jobs.status,
          version: jobs.version,
          isBlocked: jobs.isBlocked,
          blockedReason: jobs.blockedReason,
        })
        .from(jobs)
        .where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, id)))
        .for('update');
      return row;
    },

    /** Jobs on the board in a stage, leaving one job out of the count. */
    async countOnBoard(tx: Tx, stageId: string, exceptJobId?: string) {
      const [row] = await tx
        .select({ n: sql<number>`count(*)::int` })
        .from(jobs)
        .where(and(eq(jobs.stageId, stageId), isNotNull(jobs.position), exceptJobId ? ne(jobs.id, exceptJobId) : undefined));
      return row?.n ?? 0;
    },

    async insert(tx: Tx, values: JobValues) {
      const [row] = await tx.insert(jobs).values(values).returning({ id: jobs.id });
      return row!.id;
    },

    /** Writes the changes and adds one to the version. */
    bump: (tx: Tx, id: string, values: Partial<JobValues>, at: Date) =>
      tx
        .update(jobs)
        .set({ ...values, version: sql`${jobs.version} + 1`, updatedAt: at })
        .where(eq(jobs.id, id)),

    recordStageChange: (tx: Tx, values: { workshopId: string; jobId: string; fromStageId: string | null; toStageId: string; byUserId: string; at: Date }) =>
      tx.insert(jobStageEvents).values(values),

    /**
     * Renumbers the other jobs of the given stages 0..n-1 in their current order, leaving the slot
     * `index` free in `target` for the moving job. One set-based statement for both stages.
     */
    makeRoom: (tx: Tx, { jobId, stageIds, target, index }: { jobId: string; stageIds: string[]; target: string; index: number }) =>
      tx.execute(sql`
        update jobs j set position = o.slot
        from (
          select id, case when stage_id = ${target} and rn >= ${index} then rn + 1 else rn end as slot
          from (
            select id, stage_id, row_number() over (partition by stage_id order by position) - 1 as rn
            from jobs
            where stage_id in (${sql.join(stageIds.map((id) => sql`${id}::uuid`), sql`, `)}) and id <> ${jobId} and position is not null
          ) ranked
        ) o
        where j.id = o.id and j.position <> o.slot`),

    /** Closes any gap in a stage's positions after a job leaves the board. One statement. */
    renumberStage: (tx: Tx, stageId: string) =>
      tx.execute(sql`
        update jobs j set position = o.rn
        from (select id, row_number() over (order by position) - 1 as rn from jobs where stage_id = ${stageId} and position is not null) o
        where j.id = o.id and j.position <> o.rn`),
  };
}

export type JobsRepo = ReturnType<typeof createJobsRepo>;
