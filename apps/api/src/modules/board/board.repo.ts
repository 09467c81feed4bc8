import { and, asc, count, eq, isNotNull, isNull, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { jobs, stages } from '@keybed/db/schema';
import type { BoardJobHours, BoardQuery } from '@keybed/shared';
import { jobSearch, selectJobs } from '../jobs/jobs.repo';
import type { TechnicianLookup } from '../jobs/technicians';

/** The whole board in a fixed number of statements, whatever the number of jobs: the stages, the jobs and their hours. */
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

    /**
     * The budgeted and logged minutes of every job on the board, in one statement: the sum of its
     * tasks' estimates, and of each time entry's whole minutes (running entries up to `at`), the
     * rule the job's costing uses. Jobs with neither are left out. Taken for the whole board
     * whatever the filters, so it runs beside the jobs' own statement rather than after it.
     */
    async hoursOnBoard(workshopId: string, at: Date): Promise<Map<string, BoardJobHours>> {
      const rows = await db.execute<{ job_id: string; estimated: string; logged: string }>(sql`
        with board as (select id from jobs where workshop_id = ${workshopId} and position is not null),
        budget as (
          select t.job_id, sum(t.estimated_minutes) as minutes from tasks t join board b on b.id = t.job_id group by t.job_id),
        logged as (
          select e.job_id, sum(floor(extract(epoch from coalesce(e.ended_at, ${at.toISOString()}::timestamptz) - e.started_at) / 60)) as minutes
          from time_entries e join board b on b.id = e.job_id group by e.job_id)
        select coalesce(b.job_id, l.job_id) as job_id, coalesce(b.minutes, 0)::text as estimated, coalesce(l.minutes, 0)::text as logged
        from budget b full join logged l on l.job_id = b.job_id`);
      return new Map([...rows].map((r) => [r.job_id, { estimatedMinutes: Number(r.estimated), loggedMinutes: Number(r.logged) }]));
    },
  };
}

export type BoardRepo = ReturnType<typeof createBoardRepo>;
