import { describe, expect, it } from 'vitest';
import type { WallPart, WallTask } from '@keybed/shared';
import { defaultPartTask, matchParts } from './wall-parts';

// The demo catalogue (SCENARIO.md).
const part = (id: string, sku: string, name: string, unit: string, onHandMilli = 2000, isLowStock = false): WallPart => ({ id, sku, name, unit, onHandMilli, isLowStock });
const parts = [
  part('p1', 'HS-G88', 'Hammer set, grand, 88', 'set'),
  part('p2', 'HS-U88', 'Hammer set, upright, 88', 'set', 0, true),
  part('p3', 'KBC-1', 'Key bushing cloth', 'm', 6500),
  part('p4', 'SF-1', 'Shellac flakes', 'kg', 1500),
];

describe('matchParts', () => {
  it('when nothing is searched for, then every part is offered in the catalogue’s order', () => {
    expect(matchParts(parts, '  ').map((p) => p.id)).toEqual(['p1', 'p2', 'p3', 'p4']);
  });

  it('when words are searched for, then a part must hold every one of them, in any case, in its name, SKU or unit', () => {
    expect(matchParts(parts, 'hammer GRAND').map((p) => p.id)).toEqual(['p1']);
    expect(matchParts(parts, 'hs-u').map((p) => p.id)).toEqual(['p2']);
    expect(matchParts(parts, 'kg').map((p) => p.id)).toEqual(['p4']);
    expect(matchParts(parts, 'hammer felt')).toEqual([]);
  });
});

describe('defaultPartTask', () => {
  const job = { id: 'salon', title: 'Salon grand: new hammers, rebush, regulation', clientName: 'Harriet Pembleton', pianoLabel: 'Carrow & Finch Salon grand' };
  const tasks: WallTask[] = [
    { id: 't4', title: 'Hang new hammers', status: 'in_progress', isAssigned: true, job, stage: null },
    { id: 't5', title: 'Rebush the keys', status: 'todo', isAssigned: true, job, stage: null },
  ];

  it('when they are on one of their open tasks, then parts go to it unless they choose another', () => {
    expect(defaultPartTask(tasks, 't5')?.id).toBe('t5');
  });

  it('when they are on nothing, or on a task no longer open, then there is no default and they choose', () => {
    expect(defaultPartTask(tasks, undefined)).toBeUndefined();
    expect(defaultPartTask(tasks, 't9')).toBeUndefined();
  });
});
