import { describe, expect, it } from 'vitest';
import type { Task } from '@keybed/shared';
import { applyTaskChange, stepTarget } from './task-order';

const task = (n: number, title: string): Task => ({
  id: `task-${n}`,
  jobId: 'salon-grand',
  stage: { id: 'hammers', name: 'Hammers' },
  title,
  status: 'todo',
  estimatedMinutes: 60,
  loggedMinutes: 0,
  position: n,
  version: 1,
  assignees: [],
  createdAt: '2026-03-02T08:00:00Z',
  updatedAt: '2026-03-02T08:00:00Z',
});

const hammers = [task(0, 'Remove old hammers'), task(1, 'Hang new hammers'), task(2, 'Travel and space'), task(3, 'Shape and voice')];
const titles = (tasks: Task[]) => tasks.map((t) => t.title);

describe('applyTaskChange', () => {
  it('when a task moves up one place, then it swaps with the one above and positions are renumbered', () => {
    const next = applyTaskChange(hammers, 'task-2', { version: 1, position: 1 });
    expect(titles(next)).toEqual(['Remove old hammers', 'Travel and space', 'Hang new hammers', 'Shape and voice']);
    expect(next.map((t) => t.position)).toEqual([0, 1, 2, 3]);
  });

  it('when a task moves to the end, then the others close the gap', () => {
    expect(titles(applyTaskChange(hammers, 'task-0', { version: 1, position: 3 }))).toEqual(['Hang new hammers', 'Travel and space', 'Shape and voice', 'Remove old hammers']);
  });

  it('when only the status changes, then the order stays and only that task changes', () => {
    const next = applyTaskChange(hammers, 'task-1', { version: 1, status: 'done' });
    expect(next.map((t) => t.status)).toEqual(['todo', 'done', 'todo', 'todo']);
  });
});

describe('stepTarget', () => {
  it('when the task is first or last, then it cannot step past the end', () => {
    expect(stepTarget(hammers, 'task-0', -1)).toBeUndefined();
    expect(stepTarget(hammers, 'task-3', 1)).toBeUndefined();
    expect(stepTarget(hammers, 'task-1', -1)).toBe(0);
    expect(stepTarget(hammers, 'task-1', 1)).toBe(2);
  });
});
