import { describe, expect, it } from 'vitest';
import type { WallTask } from '@keybed/shared';
import { groupTasks, matchTasks } from './wall-tasks';

const salon = { id: 'salon', title: 'Salon grand: new hammers, rebush, regulation', clientName: 'Harriet Pembleton', pianoLabel: 'Carrow & Finch Salon grand' };
const linwood = { id: 'linwood', title: 'School upright: moth damage', clientName: 'Linwood Hall School (music dept.)', pianoLabel: 'Osterholt upright' };

const task = (id: string, title: string, job: WallTask['job'], isAssigned: boolean, stage: string | null = null): WallTask => ({
  id,
  title,
  status: 'todo',
  isAssigned,
  job,
  stage: stage ? { id: stage, name: stage } : null,
});

const tasks = [
  task('t4', 'Hang new hammers', salon, true, 'Hammers'),
  task('t13', 'Regulate the action', linwood, true, 'Regulation'),
  task('t8', 'Fine tuning', salon, false, 'Finish'),
  task('t14', 'Pitch raise', linwood, false, 'Regulation'),
  task('t16', 'Clean and polish the case', linwood, false, 'Finish'),
];

describe('groupTasks', () => {
  it('when some tasks are the technician’s, then they come first and the rest are grouped by job', () => {
    const { assigned, others } = groupTasks(tasks);
    expect(assigned.map((t) => t.id)).toEqual(['t4', 't13']);
    expect(others.map((g) => [g.job.id, g.tasks.map((t) => t.id)])).toEqual([
      ['salon', ['t8']],
      ['linwood', ['t14', 't16']],
    ]);
  });
});

describe('matchTasks', () => {
  it('when searching by client and stage words together, then only tasks matching every word stay', () => {
    expect(matchTasks(tasks, 'linwood finish').map((t) => t.id)).toEqual(['t16']);
  });

  it('when searching by piano maker, case aside, then that piano’s tasks stay', () => {
    expect(matchTasks(tasks, 'CARROW').map((t) => t.id)).toEqual(['t4', 't8']);
  });

  it('when the search is blank, then every task stays', () => {
    expect(matchTasks(tasks, '  ')).toHaveLength(5);
  });
});
