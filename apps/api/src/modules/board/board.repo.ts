import { and, asc, count, eq, isNotNull, isNull } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { jobs, stages } from '@keybed/db/schema';
import type { BoardQuery } from '@keybed/shared';
import { jobSearch, selectJobs } from '../jobs/jobs.repo';
import type { TechnicianLookup } from '../jobs/technicians';

/** The whole board in two statements, whatever the number of jobs: the stages, then the jobs. */
export function createBoardRepo(db: Database, technicians: TechnicianLookup) {
  return {
    /** Active stages in order, each with its count of jobs on the board (filters do not apply). */
    activeStages: (workshopId: string) =>
      db
        .select({ id: stages.id, name: stages.name, position: stages.position, wipLimit: stages.wipLimit, jobCount: count(jobs.id) })
        .from(stages)
        // Jobs on the board are exactly those with a position (a CHECK ties position to status).
        .leftJoin(jobs, and(eq(jobs.workshopId, stages.workshopId), eq(jobs.stageId, stages.id), isNotNull(jobs.position)))
        .where(and(eq(stages.workshopId, workshopId), isNull(stages.archivedAt)))
        .groupBy(stages.id)
        .orderBy(asc(stages.position)),

    /** Every job on the board that passes the filters, with its client and piano, by position. */
    jobsOnBoard: (workshopId: string, { q, blocked, technicianId }: BoardQuery) =>
      selectJobs(db)
        .where(
          and(
            eq(jobs.workshopId, workshopId),
            isNotNull(jobs.position),
            q ? jobSearch(q) : undefined,
            blocked === undefined ? undefined : eq(jobs.isBlocked, blocked),
            technicianId ? technicians.hasOpenTaskFor(technicianId) : undefined,
          ),
        )
        .orderBy(asc(jobs.position)),
  };
}

export type BoardRepo = ReturnType<typeof createBoardRepo>;
