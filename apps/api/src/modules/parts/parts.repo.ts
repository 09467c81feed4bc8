import { and, asc, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Database } from '@keybed/db/client';
import { jobs, parts, stockMovements, taskAssignees, tasks, timeEntries, users, workshops } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;
type PartValues = typeof parts.$inferInsert;
type MovementValues = typeof stockMovements.$inferInsert;

/**
 * On hand and stock value of the part in the outer query: the sums of its movements. The outer
 * column is named with its table in full (Drizzle leaves it bare when a query has one table).
 */
const onHandOf = sql<string>`coalesce((select sum(m.quantity_milli) from stock_movements m where m.part_id = "parts"."id"), 0)::text`;
const valueOf = sql<string>`coalesce((select sum(m.value_minor) from stock_movements m where m.part_id = "parts"."id"), 0)::text`;

const selectParts = (q: Db) =>
  q
    .select({
      id: parts.id,
      sku: parts.sku,
      name: parts.name,
      unit: parts.unit,
      supplier: parts.supplier,
      unitCostMinor: parts.unitCostMinor,
      sellPriceMinor: parts.sellPriceMinor,
      markupBasisPoints: parts.markupBasisPoints,
      reorderLevelMilli: parts.reorderLevelMilli,
      isActive: parts.isActive,
      onHandMilli: onHandOf,
      stockValueMinor: valueOf,
      createdAt: parts.createdAt,
      updatedAt: parts.updatedAt,
    })
    .from(parts);

export type PartRow = Awaited<ReturnType<ReturnType<typeof selectParts>['execute']>>[number];

const movementTasks = alias(tasks, 'movement_tasks');
const movementJobs = alias(jobs, 'movement_jobs');

const selectMovements = (q: Db) =>
  q
    .select({
      id: stockMovements.id,
      partId: stockMovements.partId,
      kind: stockMovements.kind,
      quantityMilli: stockMovements.quantityMilli,
      unitCostMinor: stockMovements.unitCostMinor,
      valueMinor: stockMovements.valueMinor,
      task: { id: movementTasks.id, title: movementTasks.title },
      job: { id: movementJobs.id, title: movementJobs.title },
      reason: stockMovements.reason,
      by: { id: users.id, name: users.name },
      at: stockMovements.at,
    })
    .from(stockMovements)
    .leftJoin(movementTasks, eq(movementTasks.id, stockMovements.taskId))
    .leftJoin(movementJobs, eq(movementJobs.id, stockMovements.jobId))
    .leftJoin(users, eq(users.id, stockMovements.byUserId));

export type MovementRow = Awaited<ReturnType<ReturnType<typeof selectMovements>['execute']>>[number];

export interface PartFilter {
  q?: string;
  lowStock?: boolean;
  include: 'active' | 'all';
}

export function createPartsRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    /** The catalogue with stock on hand: one statement. */
    list(workshopId: string, filter: PartFilter, q: Db = db) {
      const conditions: SQL[] = [eq(parts.workshopId, workshopId)];
      if (filter.include === 'active') conditions.push(eq(parts.isActive, true));
      if (filter.q) {
        const like = `%${filter.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
        conditions.push(or(ilike(parts.sku, like), ilike(parts.name, like), ilike(parts.supplier, like))!);
      }
      if (filter.lowStock) conditions.push(sql`${onHandOf}::bigint <= ${parts.reorderLevelMilli}`);
      return selectParts(q).where(and(...conditions)).orderBy(asc(parts.name), asc(parts.sku));
    },

    async find(workshopId: string, id: string, q: Db = db): Promise<PartRow | undefined> {
      const [row] = await selectParts(q).where(and(eq(parts.workshopId, workshopId), eq(parts.id, id)));
      return row;
    },

    /** The part row, locked (every stock movement of a part holds it), with its workshop's stock rule. */
    async lock(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx
        .select({ id: parts.id, unitCostMinor: parts.unitCostMinor, sellPriceMinor: parts.sellPriceMinor, markupBasisPoints: parts.markupBasisPoints, allowNegativeStock: workshops.allowNegativeStock })
        .from(parts)
        .innerJoin(workshops, eq(workshops.id, parts.workshopId))
        .where(and(eq(parts.workshopId, workshopId), eq(parts.id, id)))
        .for('update', { of: parts });
      return row;
    },

    /** Quantity on hand and stock value: the sums of the part's movements. */
    async stock(q: Db, partId: string) {
      const [row] = await q.execute<{ quantity: string; value: string }>(sql`
        select coalesce(sum(quantity_milli), 0)::text as quantity, coalesce(sum(value_minor), 0)::text as value
        from stock_movements where part_id = ${partId}`);
      return { quantityMilli: Number(row!.quantity), valueMinor: Number(row!.value) };
    },

    /** What of a part sits on a task: net quantity used and its cost (uses less returns and corrections). */
    async onTask(q: Db, taskId: string, partId: string) {
      const [row] = await q.execute<{ quantity: string; value: string }>(sql`
        select coalesce(-sum(quantity_milli), 0)::text as quantity, coalesce(-sum(value_minor), 0)::text as value
        from stock_movements where task_id = ${taskId} and part_id = ${partId}`);
      return { quantityMilli: Number(row!.quantity), valueMinor: Number(row!.value) };
    },

    async insert(tx: Tx, values: PartValues) {
      const [row] = await tx.insert(parts).values(values).returning({ id: parts.id });
      return row!.id;
    },

    update: (tx: Tx, id: string, values: Partial<PartValues>) => tx.update(parts).set(values).where(eq(parts.id, id)),

    async insertMovement(tx: Tx, values: MovementValues) {
      const [row] = await tx.insert(stockMovements).values(values).returning({ id: stockMovements.id });
      return row!.id;
    },

    async movement(id: string, q: Db = db): Promise<MovementRow> {
      const [row] = await selectMovements(q).where(eq(stockMovements.id, id));
      return row!;
    },

    /** The part's latest movements, newest first. */
    movementsOfPart: (workshopId: string, partId: string, limit: number, q: Db = db) =>
      selectMovements(q)
        .where(and(eq(stockMovements.workshopId, workshopId), eq(stockMovements.partId, partId)))
        .orderBy(desc(stockMovements.at), desc(stockMovements.id))
        .limit(limit),

    movementsOfTask: (workshopId: string, taskId: string, q: Db = db) =>
      selectMovements(q)
        .where(and(eq(stockMovements.workshopId, workshopId), eq(stockMovements.taskId, taskId)))
        .orderBy(asc(stockMovements.at), asc(stockMovements.id)),

    /** Net quantity and cost of each part on a task. */
    taskTotals: (workshopId: string, taskId: string, q: Db = db) =>
      q.execute<{ part_id: string; sku: string; name: string; unit: string; quantity: string; cost: string }>(sql`
        select p.id as part_id, p.sku, p.name, p.unit, (-sum(m.quantity_milli))::text as quantity, (-sum(m.value_minor))::text as cost
        from stock_movements m join parts p on p.id = m.part_id
        where m.workshop_id = ${workshopId} and m.task_id = ${taskId}
        group by p.id order by p.name, p.sku`),

    /**
     * A task with its job and whether the user may log parts on it as a technician: assigned to it,
     * or has time on it.
     */
    async task(workshopId: string, taskId: string, userId: string | null, q: Db = db) {
      const [row] = await q
        .select({
          id: tasks.id,
          jobId: tasks.jobId,
          status: tasks.status,
          jobStatus: jobs.status,
          isOwnTask: userId
            ? sql<boolean>`exists (select 1 from ${taskAssignees} a where a.task_id = ${tasks.id} and a.user_id = ${userId})
                or exists (select 1 from ${timeEntries} e where e.task_id = ${tasks.id} and e.technician_id = ${userId})`
            : sql<boolean>`false`,
        })
        .from(tasks)
        .innerJoin(jobs, eq(jobs.id, tasks.jobId))
        .where(and(eq(tasks.workshopId, workshopId), eq(tasks.id, taskId)));
      return row;
    },
  };
}

export type PartsRepo = ReturnType<typeof createPartsRepo>;
