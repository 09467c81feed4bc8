import { and, asc, eq } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { stages, taskTemplateItems, taskTemplates } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;

export function createTaskTemplatesRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async findStage(stageId: string, q: Db = db) {
      const [row] = await q.select({ id: stages.id, name: stages.name, workshopId: stages.workshopId }).from(stages).where(eq(stages.id, stageId));
      return row;
    },

    async findTemplate(workshopId: string, stageId: string, q: Db = db) {
      const [row] = await q
        .select({ id: taskTemplates.id, updatedAt: taskTemplates.updatedAt })
        .from(taskTemplates)
        .where(and(eq(taskTemplates.workshopId, workshopId), eq(taskTemplates.stageId, stageId)));
      return row;
    },

    /** The stage's template items in order; none when the stage has no template. */
    items: (workshopId: string, stageId: string, q: Db = db) =>
      q
        .select({ id: taskTemplateItems.id, title: taskTemplateItems.title, estimatedMinutes: taskTemplateItems.estimatedMinutes, position: taskTemplateItems.position })
        .from(taskTemplateItems)
        .innerJoin(taskTemplates, eq(taskTemplates.id, taskTemplateItems.templateId))
        .where(and(eq(taskTemplates.workshopId, workshopId), eq(taskTemplates.stageId, stageId)))
        .orderBy(asc(taskTemplateItems.position)),

    /** Creates the stage's template or touches it, locked, and returns its id. */
    async upsertTemplate(tx: Tx, workshopId: string, stageId: string, at: Date) {
      const [row] = await tx
        .insert(taskTemplates)
        .values({ workshopId, stageId, updatedAt: at })
        .onConflictDoUpdate({ target: taskTemplates.stageId, set: { updatedAt: at } })
        .returning({ id: taskTemplates.id });
      return row!.id;
    },

    async replaceItems(tx: Tx, workshopId: string, templateId: string, items: Array<{ title: string; estimatedMinutes: number | null }>) {
      await tx.delete(taskTemplateItems).where(eq(taskTemplateItems.templateId, templateId));
      if (items.length > 0) {
        await tx.insert(taskTemplateItems).values(items.map((item, position) => ({ workshopId, templateId, position, ...item })));
      }
    },

    async deleteTemplate(workshopId: string, stageId: string) {
      const rows = await db
        .delete(taskTemplates)
        .where(and(eq(taskTemplates.workshopId, workshopId), eq(taskTemplates.stageId, stageId)))
        .returning({ id: taskTemplates.id });
      return rows.length > 0;
    },
  };
}

export type TaskTemplatesRepo = ReturnType<typeof createTaskTemplatesRepo>;
