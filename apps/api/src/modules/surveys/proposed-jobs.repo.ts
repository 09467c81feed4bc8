import { and, asc, eq, isNotNull, isNull, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { jobs, jobStageEvents, stages, surveys } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

/**
 * Jobs prepared from a survey. A proposed job has a stage (the first active one, where it will
 * start) but no position: it is not on the board until the client accepts, when it joins the end
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

    /**
     * Puts a proposed job at the end of the first active stage. Locks the stage, then the job;
     * answers false when the job is no longer proposed (already placed by a concurrent request).
     */
    async placeOnBoard(tx: Tx, workshopId: string, jobId: string, byUserId: string | null, at: Date) {
      const stage = await firstActiveStage(tx, workshopId);
      if (!stage) return { isPlaced: false, hasStage: false };
      const [job] = await tx.select({ status: jobs.status }).from(jobs).where(and(eq(jobs.workshopId, workshopId), eq(jobs.id, jobId))).for('update');
      if (job?.status !== 'proposed') return { isPlaced: false, hasStage: true };
      const [count] = await tx.select({ n: sql<number>`count(*)::int` }).from(jobs).where(and(eq(jobs.stageId, stage.id), isNotNull(jobs.position)));
      await tx
        .update(jobs)
        .set({ status: 'active', stageId: stage.id, position: count?.n ?? 0, version: sql`${jobs.version} + 1`, updatedAt: at })
        .where(eq(jobs.id, jobId));
      await tx.insert(jobStageEvents).values({ workshopId, jobId, fromStageId: null, toStageId: stage.id, byUserId, at });
      return { isPlaced: true, hasStage: true };
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
