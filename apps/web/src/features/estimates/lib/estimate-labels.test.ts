import { describe, expect, it } from 'vitest';
import type { Estimate } from '@keybed/shared';
import { arrange, estimateName } from './estimate-labels';

const est = (revision: number, kind: Estimate['kind'], status: Estimate['status']) => ({ id: `e${revision}`, revision, kind, status }) as Estimate;

describe('arrange', () => {
  it('when an original is accepted, then it leads, with its variations beside it and other originals as earlier revisions', () => {
    const result = arrange([est(1, 'original', 'declined'), est(2, 'original', 'accepted'), est(3, 'variation', 'accepted'), est(4, 'variation', 'draft')]);
    expect(result.current?.revision).toBe(2);
    expect(result.variations.map((e) => e.revision)).toEqual([3, 4]);
    expect(result.earlier.map((e) => e.revision)).toEqual([1]);
    expect(result).toMatchObject({ hasAccepted: true, hasDraftVariation: true });
  });

  it('when revisions replace each other, then the newest one still open leads', () => {
    const result = arrange([est(1, 'original', 'superseded'), est(2, 'original', 'issued'), est(3, 'original', 'draft')]);
    expect(result.current?.revision).toBe(3);
    expect(result.earlier.map((e) => e.revision)).toEqual([2, 1]);
  });

  it('when a job has no estimate, then nothing leads', () => {
    expect(arrange([]).current).toBeUndefined();
    expect(estimateName({ kind: 'variation', revision: 3 })).toBe('Variation 3');
  });
});
