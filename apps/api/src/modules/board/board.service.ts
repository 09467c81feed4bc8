import type { Board, BoardQuery, Job } from '@keybed/shared';
import { toJob } from '../jobs/job-view';
import type { TechnicianLookup } from '../jobs/technicians';
import type { BoardRepo } from './board.repo';

export function createBoardService({ repo, technicians }: { repo: BoardRepo; technicians: TechnicianLookup }) {
  return {
    /** Active stages in order with their jobs in position order; archived stages' jobs are not shown. */
    async get(workshopId: string, query: BoardQuery): Promise<Board> {
      const [stages, rows] = await Promise.all([repo.activeStages(workshopId), repo.jobsOnBoard(workshopId, query)]);
      const byJob = await technicians.forJobs(rows.map((r) => r.id));
      const jobsByStage = new Map<string, Job[]>(stages.map((s) => [s.id, []]));
      for (const row of rows) jobsByStage.get(row.stageId)?.push(toJob(row, byJob.get(row.id)));
      return { stages: stages.map((s) => ({ ...s, jobs: jobsByStage.get(s.id)! })) };
    },
  };
}

export type BoardService = ReturnType<typeof createBoardService>;
