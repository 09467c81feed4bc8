import { and, asc, desc, eq, getTableColumns, ilike, or } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { clients, jobs, pianos, stages } from '@keybed/db/schema';
import type { PianoListQuery } from '@keybed/shared';
import { containsPattern } from '../../lib/search';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;
type PianoValues = Omit<typeof pianos.$inferInsert, 'id' | 'workshopId' | 'createdAt' | 'updatedAt'>;

const pianoColumns = { ...getTableColumns(pianos), clientName: clients.name };
export type PianoRow = typeof pianos.$inferSelect & { clientName: string };

export function createPianosRepo(db: Database) {
  const selectPianos = (q: Db) =>
    q.select(pianoColumns).from(pianos).innerJoin(clients, and(eq(clients.id, pianos.clientId), eq(clients.workshopId, pianos.workshopId)));

  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    list(workshopId: string, { q, clientId, limit }: Pick<PianoListQuery, 'q' | 'clientId' | 'limit'>): Promise<PianoRow[]> {
      const pattern = q ? containsPattern(q) : undefined;
      return selectPianos(db)
        .where(
          and(
            eq(pianos.workshopId, workshopId),
            clientId ? eq(pianos.clientId, clientId) : undefined,
            pattern ? or(ilike(pianos.maker, pattern), ilike(pianos.model, pattern), ilike(pianos.serialNumber, pattern)) : undefined,
          ),
        )
        .orderBy(asc(pianos.maker), asc(pianos.model), asc(pianos.id))
        .limit(limit);
    },

    async find(workshopId: string, id: string, q: Db = db): Promise<PianoRow | undefined> {
      const [row] = await selectPianos(q).where(and(eq(pianos.workshopId, workshopId), eq(pianos.id, id)));
      return row;
    },

    async clientExists(tx: Tx, workshopId: string, clientId: string) {
      const [row] = await tx.select({ id: clients.id }).from(clients).where(and(eq(clients.workshopId, workshopId), eq(clients.id, clientId)));
      return Boolean(row);
    },

    async insert(tx: Tx, workshopId: string, values: PianoValues) {
      const [row] = await tx.insert(pianos).values({ ...values, workshopId }).returning({ id: pianos.id });
      return row!.id;
    },

    async update(tx: Tx, workshopId: string, id: string, values: Partial<PianoValues>, at: Date) {
      const rows = await tx
        .update(pianos)
        .set({ ...values, updatedAt: at })
        .where(and(eq(pianos.workshopId, workshopId), eq(pianos.id, id)))
        .returning({ id: pianos.id });
      return rows.length > 0;
    },

    /** The piano's jobs, newest first, with the name of the stage each is (or was last) in. */
    jobHistory: (workshopId: string, pianoId: string) =>
      db
        .select({ id: jobs.id, title: jobs.title, status: jobs.status, stageName: stages.name, createdAt: jobs.createdAt, updatedAt: jobs.updatedAt })
        .from(jobs)
        .innerJoin(stages, eq(stages.id, jobs.stageId))
        .where(and(eq(jobs.workshopId, workshopId), eq(jobs.pianoId, pianoId)))
        .orderBy(desc(jobs.createdAt), desc(jobs.id)),
  };
}

export type PianosRepo = ReturnType<typeof createPianosRepo>;
