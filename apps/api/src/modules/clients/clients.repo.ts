import { and, asc, eq, ilike, or } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { clients } from '@keybed/db/schema';
import type { ClientListQuery } from '@keybed/shared';
import { containsPattern } from '../../lib/search';
import type { Tx } from '../auth/auth.repo';

export type ClientRow = typeof clients.$inferSelect;
type ClientValues = Pick<typeof clients.$inferInsert, 'name' | 'email' | 'phone' | 'address' | 'notes'>;

export function createClientsRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    list(workshopId: string, { q, limit }: ClientListQuery) {
      const pattern = q ? containsPattern(q) : undefined;
      return db
        .select()
        .from(clients)
        .where(and(eq(clients.workshopId, workshopId), pattern ? or(ilike(clients.name, pattern), ilike(clients.email, pattern)) : undefined))
        .orderBy(asc(clients.name), asc(clients.id))
        .limit(limit);
    },

    async find(workshopId: string, id: string, q: Database | Tx = db): Promise<ClientRow | undefined> {
      const [row] = await q.select().from(clients).where(and(eq(clients.workshopId, workshopId), eq(clients.id, id)));
      return row;
    },

    async insert(tx: Tx, workshopId: string, values: ClientValues) {
      const [row] = await tx.insert(clients).values({ ...values, workshopId }).returning();
      return row!;
    },

    async update(tx: Tx, workshopId: string, id: string, values: Partial<ClientValues>, at: Date): Promise<ClientRow | undefined> {
      const [row] = await tx
        .update(clients)
        .set({ ...values, updatedAt: at })
        .where(and(eq(clients.workshopId, workshopId), eq(clients.id, id)))
        .returning();
      return row;
    },
  };
}

export type ClientsRepo = ReturnType<typeof createClientsRepo>;
