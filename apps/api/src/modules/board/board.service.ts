import type { BoardJob, BoardQuery } from '@keybed/shared';
import { toJob } from '../jobs/job-view';
import type { TechnicianLookup } from '../jobs/technicians';
import { toBoardBody, type BoardBody, type BoardCache } from './board-cache';
import type { BoardRepo } from './board.repo';

interface Deps {
  repo: BoardRepo;
  technicians: TechnicianLookup;
  cache: BoardCache;
  now: () => Date;
}

const isFiltered = (query: BoardQuery) => query.q !== undefined || query.blocked !== undefined || query.technicianId !== undefined;

const NO_HOURS = { estimatedMinutes: 0, loggedMinutes: 0 };

export function createBoardService({ repo, technicians, cache, now }: Deps) {
  /** Active stages in order with their jobs in position order and their hours as of now; archived stages' jobs are not shown. */
  async function build(workshopId: string, query: BoardQuery): Promise<BoardBody> {
    const at = now();
    const [stages, rows, hours] = await Promise.all([repo.activeStages(workshopId), repo.jobsOnBoard(workshopId, query), repo.hoursOnBoard(workshopId, at)]);
    const byJob = await technicians.forJobs(rows.map((r) => r.id));
    const jobsByStage = new Map<string, BoardJob[]>(stages.map((s) => [s.id, []]));
    for (const row of rows) jobsByStage.get(row.stageId)?.push({ ...toJob(row, byJob.get(row.id)), hours: hours.get(row.id) ?? NO_HOURS });
    return toBoardBody({ stages: stages.map((s) => ({ ...s, jobs: jobsByStage.get(s.id)! })) });
  }

  return {
    /** The board as JSON bytes (the `Board` contract); the unfiltered board comes from the cache when it can. */
    get: (workshopId: string, query: BoardQuery): Promise<BoardBody> =>
      isFiltered(query) ? build(workshopId, query) : cache.get(workshopId, () => build(workshopId, query)),
  };
}

export type BoardService = ReturnType<typeof createBoardService>;
