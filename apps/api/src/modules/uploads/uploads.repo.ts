import { and, eq } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { jobs, surveyComponents, tasks, uploads } from '@keybed/db/schema';

export type UploadRow = typeof uploads.$inferSelect;
export type UploadValues = typeof uploads.$inferInsert;

export function createUploadsRepo(db: Database) {
  const exists = async (rows: Promise<unknown[]>) => (await rows).length > 0;
  return {
    /** Whether what the photos are for is the workshop's own. */
    targetExists(workshopId: string, target: { surveyComponentId?: string; jobId?: string; taskId?: string }) {
      if (target.surveyComponentId) {
        return exists(db.select({ id: surveyComponents.id }).from(surveyComponents).where(and(eq(surveyComponents.workshopId, workshopId), eq(surveyComponents.id, target.surveyComponentId))));
      }
      if (target.jobId) return exists(db.select({ id: jobs.id }).from(jobs).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, target.jobId))));
      return exists(db.select({ id: tasks.id }).from(tasks).where(and(eq(tasks.workshopId, workshopId), eq(tasks.id, target.taskId!))));
    },

    insertAll: (rows: UploadValues[]) => db.transaction((tx) => tx.insert(uploads).values(rows).returning()),

    async find(workshopId: string, id: string) {
      const [row] = await db.select().from(uploads).where(and(eq(uploads.workshopId, workshopId), eq(uploads.id, id)));
      return row;
    },

    async setShared(workshopId: string, id: string, isSharedWithClient: boolean) {
      const [row] = await db.update(uploads).set({ isSharedWithClient }).where(and(eq(uploads.workshopId, workshopId), eq(uploads.id, id))).returning();
      return row;
    },

    async remove(workshopId: string, id: string) {
      const [row] = await db.delete(uploads).where(and(eq(uploads.workshopId, workshopId), eq(uploads.id, id))).returning();
      return row;
    },
  };
}

export type UploadsRepo = ReturnType<typeof createUploadsRepo>;
