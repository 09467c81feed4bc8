import { sql, type SQL } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { jobs } from '@keybed/db/schema';

export interface Technician {
  id: string;
  name: string;
}

/**
 * "Technicians with open tasks on a job" (assigned to a task that is not done), which the board
 * cards and the technician filter use. `forJobs` is one statement however many jobs it is given,
 * so the board stays at a constant number of statements; `hasOpenTaskFor` is an EXISTS on the
 * outer query's job.
 */
export function createTechnicianLookup(db: Database) {
  return {
    async forJobs(jobIds: readonly string[]): Promise<Map<string, Technician[]>> {
      const byJob = new Map<string, Technician[]>();
      if (jobIds.length === 0) return byJob;
      const rows = await db.execute<{ job_id: string; id: string; name: string }>(sql`
        select distinct t.job_id, u.id, u.name
        from tasks t
        join task_assignees a on a.task_id = t.id
        join users u on u.id = a.user_id
        where t.job_id in (${sql.join(jobIds.map((id) => sql`${id}::uuid`), sql`, `)}) and t.status <> 'done'
        order by u.name, u.id`);
      for (const row of rows) {
        const list = byJob.get(row.job_id) ?? [];
        list.push({ id: row.id, name: row.name });
        byJob.set(row.job_id, list);
      }
      return byJob;
    },

    hasOpenTaskFor: (technicianId: string): SQL =>
      sql`exists (select 1 from tasks t join task_assignees a on a.task_id = t.id
        where t.job_id = ${jobs.id} and a.user_id = ${technicianId} and t.status <> 'done')`,
  };
}

export type TechnicianLookup = ReturnType<typeof createTechnicianLookup>;
