import { and, asc, count, eq, inArray, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { jobs, stages } from '@keybed/db/schema';
import { ON_BOARD_STATUSES } from '@keybed/shared';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;

export function createStagesRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    /** Every stage with how many jobs it holds on the board: active stages in order, then archived ones. */
    listWithCounts: (workshopId: string, q: Db = db) =>
      q
        .select({
          id: stages.id,
          name: stages.name,
          position: stages.position,
          wipLimit: stages.wipLimit,
          archivedAt: stages.archivedAt,
          jobCount: count(jobs.id),
        })
        .from(stages)
        .leftJoin(jobs, and(eq(jobs.stageId, stages.id), inArray(jobs.status, ON_BOARD_STATUSES)))
        .where(eq(stages.workshopId, workshopId))
        .groupBy(stages.id)
        .orderBy(sql`${stages.archivedAt} is not null`, asc(stages.position)),

    /** Locks all of the workshop's stages in id order (the order every move locks them in). */
    lockAll: (tx: Tx, workshopId: string) =>
      tx
        .select({ id: stages.id, name: stages.name, archivedAt: stages.archivedAt, position: stages.position })
        .from(stages)
        .where(eq(stages.workshopId, workshopId))
        .orderBy(asc(stages.id))
        .for('update'),

    async countOnBoard(tx: Tx, stageId: string) {
      const [row] = await tx
        .select({ n: count() })
        .from(jobs)
        .where(and(eq(jobs.stageId, stageId), inArray(jobs.status, ON_BOARD_STATUSES)));
      return row?.n ?? 0;
    },

    /** Adds a stage after every other one; `renumber` then puts it at the end of the active stages. */
    async insert(tx: Tx, workshopId: string, values: { name: string; wipLimit: number | null }, position: number) {
      const [row] = await tx.insert(stages).values({ ...values, workshopId, position }).returning({ id: stages.id });
      return row!.id;
    },

    update: (tx: Tx, id: string, values: { name?: string; wipLimit?: number | null; archivedAt?: Date | null }) =>
      tx.update(stages).set(values).where(eq(stages.id, id)),

    /**
     * Renumbers the workshop's stages 0..n-1 with the active ones first, in their current order,
     * then the archived ones; `lastId`, when given, goes to the end of its group. One statement.
     */
    renumber: (tx: Tx, workshopId: string, lastId?: string) =>
      tx.execute(sql`
        update stages s set position = r.rn - 1
        from (
          select id, row_number() over (order by archived_at is not null, ${lastId ? sql`id = ${lastId}` : sql`false`}, position) as rn
          from stages where workshop_id = ${workshopId}
        ) r
        where s.id = r.id and s.position <> r.rn - 1`),

    /** Gives the listed stages positions 0..n-1 in the order listed. One statement. */
    reorder: (tx: Tx, workshopId: string, ids: string[]) =>
      tx.execute(sql`
        update stages s set position = x.ord - 1
        from unnest(array[${sql.join(ids.map((id) => sql`${id}`), sql`, `)}]::uuid[]) with ordinality as x(id, ord)
        where s.id = x.id and s.workshop_id = ${workshopId} and s.position <> x.ord - 1`),
  };
}

export type StagesRepo = ReturnType<typeof createStagesRepo>;
