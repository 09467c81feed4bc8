import { describe, expect, it } from 'vitest';
import type { TimeEntryCorrection } from '@keybed/shared';
import { correctionChanges } from './corrections';

const rebush = { id: 'task-3', title: 'Rebush keys' };
const hang = { id: 'task-4', title: 'Hang new hammers' };

const correction = (before: TimeEntryCorrection['before'], after: TimeEntryCorrection['after']): TimeEntryCorrection => ({
  id: 'c1',
  reason: 'Forgot to clock off at lunch',
  by: { id: 'tom', name: 'Tom Albright' },
  at: '2026-03-03T09:00:00Z',
  before,
  after,
});

describe('correctionChanges', () => {
  it('when the end of a day left running was set, then the line shows the old open end and the new time in London time', () => {
    const c = correction({ startedAt: '2026-06-08T07:00:00Z', endedAt: '2026-06-08T18:00:00Z', task: rebush }, { startedAt: '2026-06-08T07:00:00Z', endedAt: '2026-06-08T11:30:00Z', task: rebush });
    expect(correctionChanges(c, 'Europe/London')).toEqual(['End: 8 Jun 19:00 → 8 Jun 12:30']);
  });

  it('when the start and the task both changed, then each has its own line', () => {
    const c = correction({ startedAt: '2026-03-02T08:00:00Z', endedAt: null, task: rebush }, { startedAt: '2026-03-02T08:15:00Z', endedAt: null, task: hang });
    expect(correctionChanges(c, 'Europe/London')).toEqual(['Start: 2 Mar 08:00 → 2 Mar 08:15', 'Task: Rebush keys → Hang new hammers']);
  });
});
