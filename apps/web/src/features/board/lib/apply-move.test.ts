import { describe, expect, it } from 'vitest';
import type { Board, BoardJob, Job } from '@keybed/shared';
import { applyMove, replaceJob, serverIndexFor } from './apply-move';

const job = (id: string, stageId: string, position: number): BoardJob => ({
  id,
  title: id,
  status: 'active',
  priority: 'normal',
  stageId,
  position,
  promisedOn: null,
  isBlocked: false,
  blockedReason: null,
  notes: '',
  version: 1,
  client: { id: 'c', name: 'Harriet Pembleton' },
  piano: { id: 'p', maker: 'Carrow & Finch', model: 'Salon', type: 'grand', sizeMm: 1778, serialNumber: '', keytopMaterial: 'ivory' },
  technicians: [],
  createdAt: '2026-01-05T09:00:00Z',
  updatedAt: '2026-01-05T09:00:00Z',
  hours: { estimatedMinutes: 960, loggedMinutes: 0 },
});

/** Two stages: intake [a0 b1 c2], hammers [d0 e1]; `visible` keeps only some jobs, as a filter would. */
function board(visible?: string[]): Board {
  const show = (j: BoardJob) => !visible || visible.includes(j.id);
  return {
    stages: [
      { id: 'intake', name: 'Intake', position: 0, wipLimit: null, jobCount: 3, jobs: [job('a', 'intake', 0), job('b', 'intake', 1), job('c', 'intake', 2)].filter(show) },
      { id: 'hammers', name: 'Hammers', position: 1, wipLimit: 2, jobCount: 2, jobs: [job('d', 'hammers', 0), job('e', 'hammers', 1)].filter(show) },
    ],
  };
}

const order = (b: Board) => b.stages.map((s) => s.jobs.map((j) => `${j.id}${j.position}`).join(' '));

describe('serverIndexFor', () => {
  it.each([
    ['down to the end of its own stage', 'a', 'intake', 2, 2],
    ['up to the top of its own stage', 'c', 'intake', 0, 0],
    ['one place down', 'a', 'intake', 1, 1],
    ['into another stage between two jobs', 'a', 'hammers', 1, 1],
    ['to the end of another stage', 'a', 'hammers', 2, 2],
  ])('when a job moves %s, then the index counts the stage’s other jobs', (_what, id, to, visible, expected) => {
    expect(serverIndexFor(board(), id, to, visible)).toBe(expected);
  });

  it('when the column is filtered, then the index lands before the visible card it was dropped on', () => {
    // Only a and c are visible in intake; dropping d before c means place 2 of intake (after a and b).
    expect(serverIndexFor(board(['a', 'c', 'd']), 'd', 'intake', 1)).toBe(2);
  });

  it('when a filtered column shows no other card, then the job goes to the end of the stage', () => {
    expect(serverIndexFor(board(['a']), 'a', 'hammers', 0)).toBe(2);
  });
});

describe('applyMove', () => {
  it('when a job changes stage, then both stages renumber without gaps and the counts follow', () => {
    const next = applyMove(board(), { jobId: 'b', toStageId: 'hammers', index: 1 });
    expect(order(next)).toEqual(['a0 c1', 'd0 b1 e2']);
    expect(next.stages.map((s) => s.jobCount)).toEqual([2, 3]);
  });

  it('when a job moves within its stage, then the others shift and the count stays', () => {
    const next = applyMove(board(), { jobId: 'a', toStageId: 'intake', index: 2 });
    expect(order(next)).toEqual(['b0 c1 a2', 'd0 e1']);
    expect(next.stages[0]?.jobCount).toBe(3);
  });

  it('when the board is filtered, then hidden jobs keep their true places', () => {
    const next = applyMove(board(['a', 'c', 'd']), { jobId: 'd', toStageId: 'intake', index: 2 });
    expect(order(next)).toEqual(['a0 d2 c3', '']);
  });

  it('when the job is not on this board, then the board is unchanged', () => {
    const before = board(['a']);
    expect(applyMove(before, { jobId: 'e', toStageId: 'intake', index: 0 })).toBe(before);
  });
});

describe('replaceJob', () => {
  it('when the server answers a move with the job (no hours), then the card takes its new version and place and keeps its hours', () => {
    const logged = { ...board(), stages: board().stages.map((s) => ({ ...s, jobs: s.jobs.map((j) => (j.id === 'a' ? { ...j, hours: { estimatedMinutes: 960, loggedMinutes: 125 } } : j)) })) };
    const { hours: _hours, ...answered } = { ...job('a', 'hammers', 1), version: 2 };
    const after = replaceJob(logged, answered satisfies Job);
    const card = after.stages[0]!.jobs.find((j) => j.id === 'a')!;
    expect(card).toMatchObject({ version: 2, stageId: 'hammers', position: 1, hours: { estimatedMinutes: 960, loggedMinutes: 125 } });
  });
});
