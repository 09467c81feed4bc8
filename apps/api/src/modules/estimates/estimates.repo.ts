import { and, asc, eq, inArray, isNotNull, isNull, max, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { estimateLines, estimateOptions, estimates, jobs, jobStageEvents, parts, stages, tasks, users } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;

const selectEstimates = (q: Db) =>
  q
    .select({
      id: estimates.id,
      jobId: estimates.jobId,
      revision: estimates.revision,
      kind: estimates.kind,
      status: estimates.status,
      title: estimates.title,
      notes: estimates.notes,
      version: estimates.version,
      acceptedNetMinor: estimates.acceptedNetMinor,
      issuedAt: estimates.issuedAt,
      acceptedAt: estimates.acceptedAt,
      declinedAt: estimates.declinedAt,
      createdBy: { id: users.id, name: users.name },
      createdAt: estimates.createdAt,
      updatedAt: estimates.updatedAt,
    })
    .from(estimates)
    .leftJoin(users, eq(users.id, estimates.createdBy));

export type EstimateRow = Awaited<ReturnType<ReturnType<typeof selectEstimates>['execute']>>[number];

const selectOptions = (q: Db) =>
  q
    .select({ id: estimateOptions.id, estimateId: estimateOptions.estimateId, key: estimateOptions.key, choice: estimateOptions.choice, name: estimateOptions.name, position: estimateOptions.position, isChosen: estimateOptions.isChosen })
    .from(estimateOptions);

export type OptionRow = Awaited<ReturnType<ReturnType<typeof selectOptions>['execute']>>[number];

const selectLines = (q: Db) =>
  q
    .select({
      id: estimateLines.id,
      estimateId: estimateLines.estimateId,
      position: estimateLines.position,
      kind: estimateLines.kind,
      description: estimateLines.description,
      taskId: estimateLines.taskId,
      taskTitle: tasks.title,
      partId: estimateLines.partId,
      part: { id: parts.id, sku: parts.sku, name: parts.name, unit: parts.unit },
      optionId: estimateLines.optionId,
      minutes: estimateLines.minutes,
      quantityMilli: estimateLines.quantityMilli,
      unitPriceMinor: estimateLines.unitPriceMinor,
      unitCostMinor: estimateLines.unitCostMinor,
      amountMinor: estimateLines.amountMinor,
      costMinor: estimateLines.costMinor,
    })
    .from(estimateLines)
    .leftJoin(tasks, eq(tasks.id, estimateLines.taskId))
    .leftJoin(parts, eq(parts.id, estimateLines.partId));

export type LineRow = Awaited<ReturnType<ReturnType<typeof selectLines>['execute']>>[number];

export function createEstimatesRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async jobExists(workshopId: string, jobId: string) {
      const [row] = await db.select({ id: jobs.id }).from(jobs).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, jobId)));
      return Boolean(row);
    },

    /** The job row, locked: estimate writes and the tasks they create run one after another per job. */
    async lockJob(tx: Tx, workshopId: string, jobId: string) {
      const [row] = await tx.select({ id: jobs.id, status: jobs.status }).from(jobs).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, jobId))).for('update');
      return row;
    },

    /** An estimate's job and its status without locking, to learn what to lock first. */
    async peekJob(workshopId: string, id: string) {
      const [row] = await db
        .select({ jobId: estimates.jobId, jobStatus: jobs.status })
        .from(estimates)
        .innerJoin(jobs, eq(jobs.id, estimates.jobId))
        .where(and(eq(estimates.workshopId, workshopId), eq(estimates.id, id)));
      return row;
    },

    /** The board's first active stage, locked (taken before the job: the board's lock order is stage, then job). */
    async lockFirstActiveStage(tx: Tx, workshopId: string) {
      const [row] = await tx
        .select({ id: stages.id })
        .from(stages)
        .where(and(eq(stages.workshopId, workshopId), isNull(stages.archivedAt)))
        .orderBy(asc(stages.position))
        .limit(1)
        .for('update');
      return row;
    },

    /**
     * Puts a proposed job (locked, with its stage) on the board at the end of `stageId`, active,
     * with its first stage event. `byUserId` null: the client's own answer through their link.
     */
    async placeOnBoard(tx: Tx, v: { workshopId: string; jobId: string; stageId: string; byUserId: string | null; at: Date }) {
      const [count] = await tx.select({ n: sql<number>`count(*)::int` }).from(jobs).where(and(eq(jobs.stageId, v.stageId), isNotNull(jobs.position)));
      await tx
        .update(jobs)
        .set({ status: 'active', stageId: v.stageId, position: count?.n ?? 0, version: sql`${jobs.version} + 1`, updatedAt: v.at })
        .where(and(eq(jobs.id, v.jobId), eq(jobs.status, 'proposed')));
      await tx.insert(jobStageEvents).values({ workshopId: v.workshopId, jobId: v.jobId, fromStageId: null, toStageId: v.stageId, byUserId: v.byUserId, at: v.at });
    },

    async lock(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx
        .select({ id: estimates.id, jobId: estimates.jobId, kind: estimates.kind, status: estimates.status, version: estimates.version })
        .from(estimates)
        .where(and(eq(estimates.workshopId, workshopId), eq(estimates.id, id)))
        .for('update');
      return row;
    },

    /** Estimates with their options and lines: three statements however many there are. */
    async load(workshopId: string, where: { jobId?: string; id?: string }, q: Db = db) {
      const rows = await selectEstimates(q)
        .where(and(eq(estimates.workshopId, workshopId), where.jobId ? eq(estimates.jobId, where.jobId) : undefined, where.id ? eq(estimates.id, where.id) : undefined))
        .orderBy(asc(estimates.revision));
      const ids = rows.map((r) => r.id);
      if (ids.length === 0) return { rows, options: [] as OptionRow[], lines: [] as LineRow[] };
      const [options, lines] = await Promise.all([
        selectOptions(q).where(inArray(estimateOptions.estimateId, ids)).orderBy(asc(estimateOptions.position)),
        selectLines(q).where(inArray(estimateLines.estimateId, ids)).orderBy(asc(estimateLines.position)),
      ]);
      return { rows, options, lines };
    },

    async hasAcceptedOriginal(tx: Tx, jobId: string) {
      const [row] = await tx.select({ id: estimates.id }).from(estimates).where(and(eq(estimates.jobId, jobId), eq(estimates.kind, 'original'), eq(estimates.status, 'accepted')));
      return Boolean(row);
    },

    async nextRevision(tx: Tx, jobId: string) {
      const [row] = await tx.select({ n: max(estimates.revision) }).from(estimates).where(eq(estimates.jobId, jobId));
      return (row?.n ?? 0) + 1;
    },

    async insert(tx: Tx, values: typeof estimates.$inferInsert) {
      const [row] = await tx.insert(estimates).values(values).returning({ id: estimates.id });
      return row!.id;
    },

    bump: (tx: Tx, id: string, values: Partial<typeof estimates.$inferInsert>, at: Date) =>
      tx
        .update(estimates)
        .set({ ...values, version: sql`${estimates.version} + 1`, updatedAt: at })
        .where(eq(estimates.id, id)),

    /** Other originals of the job still open (draft or issued) become superseded. */
    supersedeOtherOriginals: (tx: Tx, jobId: string, keepId: string, statuses: Array<'draft' | 'issued'>, at: Date) =>
      tx
        .update(estimates)
        .set({ status: 'superseded', version: sql`${estimates.version} + 1`, updatedAt: at })
        .where(and(eq(estimates.jobId, jobId), eq(estimates.kind, 'original'), inArray(estimates.status, statuses), sql`${estimates.id} <> ${keepId}`)),

    /** Replaces an estimate's options and lines (lines first: they point at options). */
    async replaceContent(tx: Tx, estimateId: string, options: Array<typeof estimateOptions.$inferInsert>, lines: Array<typeof estimateLines.$inferInsert>) {
      await tx.delete(estimateLines).where(eq(estimateLines.estimateId, estimateId));
      await tx.delete(estimateOptions).where(eq(estimateOptions.estimateId, estimateId));
      if (options.length > 0) await tx.insert(estimateOptions).values(options);
      if (lines.length > 0) await tx.insert(estimateLines).values(lines);
    },

    /** Catalogue parts by id in the workshop. */
    partsByIds: (workshopId: string, ids: string[], q: Db = db) =>
      ids.length === 0
        ? Promise.resolve([])
        : q
            .select({ id: parts.id, name: parts.name, unitCostMinor: parts.unitCostMinor, sellPriceMinor: parts.sellPriceMinor, markupBasisPoints: parts.markupBasisPoints })
            .from(parts)
            .where(and(eq(parts.workshopId, workshopId), inArray(parts.id, ids))),

    /** Which of these task ids are tasks of the job. */
    async taskIdsOfJob(q: Db, jobId: string, ids: string[]) {
      if (ids.length === 0) return new Set<string>();
      const rows = await q.select({ id: tasks.id }).from(tasks).where(and(eq(tasks.jobId, jobId), inArray(tasks.id, ids)));
      return new Set(rows.map((r) => r.id));
    },

    setChosen: (tx: Tx, estimateId: string, optionIds: string[]) =>
      tx
        .update(estimateOptions)
        .set({ isChosen: optionIds.length > 0 ? inArray(estimateOptions.id, optionIds) : sql`false` })
        .where(eq(estimateOptions.estimateId, estimateId)),

    /** The next free task position on the job (the job row is locked). */
    async nextTaskPosition(tx: Tx, jobId: string) {
      const [row] = await tx.select({ n: sql<number>`coalesce(max(${tasks.position}) + 1, 0)::int` }).from(tasks).where(eq(tasks.jobId, jobId));
      return row?.n ?? 0;
    },

    async insertTask(tx: Tx, values: typeof tasks.$inferInsert) {
      const [row] = await tx.insert(tasks).values(values).returning({ id: tasks.id });
      return row!.id;
    },

    linkLineToTask: (tx: Tx, lineId: string, taskId: string) => tx.update(estimateLines).set({ taskId }).where(eq(estimateLines.id, lineId)),

    /**
     * Sets each budgeted task's estimate to the labour minutes of the job's accepted estimates
     * (original and variations, chosen options only): one statement. Answers the tasks changed.
     */
    async applyLabourBudget(tx: Tx, jobId: string, at: Date) {
      const rows = await tx.execute<{ id: string }>(sql`
        update tasks t set estimated_minutes = b.minutes, version = t.version + 1, updated_at = ${at.toISOString()}::timestamptz
        from (
          select l.task_id, sum(l.minutes)::int as minutes
          from estimate_lines l
          join estimates e on e.id = l.estimate_id
          left join estimate_options o on o.id = l.option_id
          where e.job_id = ${jobId} and e.status = 'accepted' and l.kind = 'labour' and l.task_id is not null
            and (l.option_id is null or o.is_chosen)
          group by l.task_id
        ) b
        where t.id = b.task_id and t.estimated_minutes is distinct from b.minutes
        returning t.id`);
      return [...rows].map((r) => r.id);
    },
  };
}

export type EstimatesRepo = ReturnType<typeof createEstimatesRepo>;
