import { sql, type SQL } from 'drizzle-orm';

export interface Technician {
  id: string;
  name: string;
}

/**
 * The seam for "technicians with open tasks on a job", which the board cards and the technician
 * filter use. Tasks arrive with the bench work; until then no job has an open task, so every
 * job's list is empty and filtering by a technician matches no job. When tasks exist, `forJobs`
 * becomes one query over the tasks of all the given jobs (the board stays at a constant number of
 * statements) and `hasOpenTaskFor` an EXISTS over the job's open tasks.
 */
export const technicianLookup = {
  forJobs: async (_jobIds: readonly string[]): Promise<Map<string, Technician[]>> => new Map(),
  hasOpenTaskFor: (_technicianId: string): SQL => sql`false`,
};

export type TechnicianLookup = typeof technicianLookup;
