import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { catalogueLines, catalogueOperations, parts } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;
export type OperationRow = typeof catalogueOperations.$inferSelect;
export type OperationValues = typeof catalogueOperations.$inferInsert;
export type CatalogueLineValues = Omit<typeof catalogueLines.$inferInsert, 'operationId' | 'workshopId' | 'position'>;

export function createCatalogueRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    list: (workshopId: string, filter: { pianoType?: 'grand' | 'upright'; includeInactive?: boolean; ids?: string[] }, q: Db = db) =>
      q
        .select()
        .from(catalogueOperations)
        .where(
          and(
            eq(catalogueOperations.workshopId, workshopId),
            filter.includeInactive ? undefined : eq(catalogueOperations.isActive, true),
            filter.pianoType ? sql`(${catalogueOperations.pianoType} is null or ${catalogueOperations.pianoType} = ${filter.pianoType})` : undefined,
            filter.ids ? inArray(catalogueOperations.id, filter.ids.length > 0 ? filter.ids : ['00000000-0000-0000-0000-000000000000']) : undefined,
          ),
        )
        .orderBy(asc(catalogueOperations.name), asc(catalogueOperations.id)),

    linesOf: (operationIds: string[], q: Db = db) =>
      operationIds.length === 0
        ? Promise.resolve([])
        : q
            .select({
              line: catalogueLines,
              part: { id: parts.id, sku: parts.sku, name: parts.name, unit: parts.unit, unitCostMinor: parts.unitCostMinor, sellPriceMinor: parts.sellPriceMinor, markupBasisPoints: parts.markupBasisPoints },
            })
            .from(catalogueLines)
            .leftJoin(parts, eq(parts.id, catalogueLines.partId))
            .where(inArray(catalogueLines.operationId, operationIds))
            .orderBy(asc(catalogueLines.operationId), asc(catalogueLines.position)),

    async partIdsOf(workshopId: string, ids: string[], q: Db = db) {
      if (ids.length === 0) return new Set<string>();
      const rows = await q.select({ id: parts.id }).from(parts).where(and(eq(parts.workshopId, workshopId), inArray(parts.id, ids)));
      return new Set(rows.map((r) => r.id));
    },

    async insert(tx: Tx, values: OperationValues) {
      const [row] = await tx.insert(catalogueOperations).values(values).returning({ id: catalogueOperations.id });
      return row!.id;
    },

    async lock(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx.select().from(catalogueOperations).where(and(eq(catalogueOperations.workshopId, workshopId), eq(catalogueOperations.id, id))).for('update');
      return row;
    },

    async update(tx: Tx, id: string, values: Partial<OperationValues>, at: Date) {
      await tx
        .update(catalogueOperations)
        .set({ ...values, version: sql`${catalogueOperations.version} + 1`, updatedAt: at })
        .where(eq(catalogueOperations.id, id));
    },

    async replaceLines(tx: Tx, workshopId: string, operationId: string, lines: CatalogueLineValues[]) {
      await tx.delete(catalogueLines).where(eq(catalogueLines.operationId, operationId));
      if (lines.length > 0) await tx.insert(catalogueLines).values(lines.map((l, position) => ({ ...l, workshopId, operationId, position })));
    },
  };
}

export type CatalogueRepo = ReturnType<typeof createCatalogueRepo>;
export type CatalogueLineRow = Awaited<ReturnType<CatalogueRepo['linesOf']>>[number];
