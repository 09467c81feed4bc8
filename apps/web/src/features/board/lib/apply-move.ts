import type { Board, BoardJob, Job } from '@keybed/shared';

type BoardStage = Board['stages'][number];

export interface BoardMove {
  jobId: string;
  toStageId: string;
  /** 0-based place among the target stage's other jobs on the board, as the API takes it. */
  index: number;
}

/** A job's place in its stage; jobs on the board always have one, the array index is a fallback. */
const placeOf = (stage: BoardStage, job: BoardJob) => job.position ?? stage.jobs.indexOf(job);

export function findJob(board: Board, jobId: string): { stage: BoardStage; job: BoardJob } | undefined {
  for (const stage of board.stages) {
    const job = stage.jobs.find((j) => j.id === jobId);
    if (job) return { stage, job };
  }
  return undefined;
}

/**
 * The API's index for a drop at `visibleIndex` in a column that may be filtered: the place of the
 * visible card it lands before (or after the last one), counted among all the stage's jobs.
 */
export function serverIndexFor(board: Board, jobId: string, toStageId: string, visibleIndex: number): number | undefined {
  const found = findJob(board, jobId);
  const target = board.stages.find((s) => s.id === toStageId);
  if (!found || !target) return undefined;
  const isSameStage = found.stage.id === toStageId;
  const from = placeOf(found.stage, found.job);
  const others = target.jobs.filter((j) => j.id !== jobId);
  if (others.length === 0) return isSameStage ? from : target.jobCount;
  const anchor = others[Math.min(visibleIndex, others.length - 1)]!;
  const place = placeOf(target, anchor) + (visibleIndex >= others.length ? 1 : 0);
  return isSameStage && from < place ? place - 1 : place;
}

/**
 * The board after `move`, as the server will order it: the gap left behind closes, later jobs in
 * the target make room, counts follow. A board that does not show the job (filtered) is unchanged.
 */
export function applyMove(board: Board, move: BoardMove): Board {
  const found = findJob(board, move.jobId);
  if (!found || !board.stages.some((s) => s.id === move.toStageId)) return board;
  const from = placeOf(found.stage, found.job);
  const isSameStage = found.stage.id === move.toStageId;
  const moved: BoardJob & { position: number } = { ...found.job, stageId: move.toStageId, position: move.index };

  return {
    ...board,
    stages: board.stages.map((stage) => {
      const isSource = stage.id === found.stage.id;
      const isTarget = stage.id === move.toStageId;
      if (!isSource && !isTarget) return stage;
      let jobs = stage.jobs.filter((j) => j.id !== move.jobId).map((j) => ({ ...j, position: placeOf(stage, j) }));
      if (isSource) jobs = jobs.map((j) => (j.position > from ? { ...j, position: j.position - 1 } : j));
      if (isTarget) {
        jobs = jobs.map((j) => (j.position >= move.index ? { ...j, position: j.position + 1 } : j));
        jobs = [...jobs, moved].sort((a, b) => a.position - b.position);
      }
      const countChange = isSameStage ? 0 : isTarget ? 1 : -1;
      return { ...stage, jobs, jobCount: stage.jobCount + countChange };
    }),
  };
}

/** The board with the server's copy of one job put in place of the cached one (new version; the card keeps its hours). */
export function replaceJob(board: Board, job: Job): Board {
  return {
    ...board,
    stages: board.stages.map((stage) =>
      stage.jobs.some((j) => j.id === job.id) ? { ...stage, jobs: stage.jobs.map((j) => (j.id === job.id ? { ...j, ...job } : j)) } : stage,
    ),
  };
}
