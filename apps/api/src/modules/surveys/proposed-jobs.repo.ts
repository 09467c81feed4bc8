import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { jobs, stages, surveys } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

/**
 * Jobs prepared from a survey. A proposed job has a stage (the first active one, where it will
 * start) but no position: it is not on the board until its estimate is accepted (by the client
 * through their link or by the owner in the app), when the estimates service puts it at the end
 * of the board's first active stage with its first stage event.
 */
export function createProposedJobsRepo(db: Database) {
  async function firstActiveStage(tx: Tx, workshopId: string) {
    const [row] = await tx
      .select({ id: stages.id })
      .from(stages)
      .where(and(eq(stages.workshopId, workshopId), isNull(stages.archivedAt)))
      .orderBy(asc(stages.position))
      .limit(1)
      .for('update');
    return row;
  }

  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async jobOf(workshopId: string, jobId: string, q: Database | Tx = db) {
      const [row] = await q.select({ id: jobs.id, status: jobs.status, title: jobs.title }).from(jobs).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, jobId)));
      return row;
    },

    /** A proposed job for the survey's piano, linked to the survey; null when the board has no active stage. */
    async create(tx: Tx, v: { workshopId: string; surveyId: string; clientId: string; pianoId: string; title: string; at: Date }) {
      const stage = await firstActiveStage(tx, v.workshopId);
      if (!stage) return null;
      const [row] = await tx
        .insert(jobs)
        .values({ workshopId: v.workshopId, clientId: v.clientId, pianoId: v.pianoId, stageId: stage.id, position: null, title: v.title, status: 'proposed', createdAt: v.at, updatedAt: v.at })
        .returning({ id: jobs.id });
      await tx.update(surveys).set({ jobId: row!.id, updatedAt: v.at }).where(eq(surveys.id, v.surveyId));
      return row!.id;
    },

    /** Undoes `create` when the estimate could not be made: the survey forgets the job, the job goes. */
    async remove(workshopId: string, surveyId: string, jobId: string) {
      await db.transaction(async (tx) => {
        await tx.update(surveys).set({ jobId: null }).where(and(eq(surveys.id, surveyId), eq(surveys.jobId, jobId)));
        await tx.delete(jobs).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, jobId), eq(jobs.status, 'proposed')));
      });
    },

    /** A proposed job whose estimate the client declined is cancelled (it never reached the board). */
    async cancelProposed(tx: Tx, workshopId: string, jobId: string, at: Date) {
      await tx
        .update(jobs)
        .set({ status: 'cancelled', version: sql`${jobs.version} + 1`, updatedAt: at })
        .where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, jobId), eq(jobs.status, 'proposed')));
    },
  };
}

export type ProposedJobsRepo = ReturnType<typeof createProposedJobsRepo>;
