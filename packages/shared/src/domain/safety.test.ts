import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTIONS, cautionsForStage, cautionsForTask, cautionsForWork } from './safety';

const ids = (text: string) => cautionsForWork(text).map((c) => c.id);

describe('cautionsForWork', () => {
  it.each([
    { text: 'Full restring, new tuning pins', expected: ['restringing'] },
    { text: 'Pitch raise', expected: ['restringing'] },
    { text: 'Pitch-raise to A440 in two passes', expected: ['restringing'] },
    { text: 'Replace broken bass strings', expected: ['restringing'] },
    { text: 'Rebalance keys, replace key leads', expected: ['lead-key-weights'] },
    { text: 'Add key weights', expected: ['lead-key-weights'] },
    { text: 'Strip and refinish the case', expected: ['finishing'] },
    { text: 'Revive the shellac', expected: ['finishing'] },
    { text: 'Black polyester refinish (sublet to Heathside Finishers)', expected: ['finishing'] },
    { text: 'French polish the fall board', expected: ['finishing'] },
    { text: 'Spray black satin lacquer', expected: ['finishing'] },
    { text: 'Collect from Linwood Hall School', expected: ['moving'] },
    { text: 'Deliver to Harriet Pembleton', expected: ['moving'] },
    { text: 'Delivery', expected: ['moving'] },
    { text: 'Move the Osterholt upright to the bench', expected: ['moving'] },
    { text: 'Restring and refinish before delivery', expected: ['moving', 'restringing', 'finishing'] },
    { text: 'Clean and polish the case', expected: ['finishing'] },
    { text: 'Hang new hammers', expected: [] },
    { text: 'Strip-down', expected: [] },
    { text: 'Strip down the action', expected: [] },
    { text: 'Measure string heights and strike line', expected: [] },
    { text: 'Remove old hammer heads', expected: [] },
    { text: 'Rebush keys', expected: [] },
    { text: 'New dampers', expected: [] },
    { text: 'Soundboard crack repair', expected: [] },
    { text: 'Full regulation', expected: [] },
    { text: 'Finishing', expected: [] },
    { text: '', expected: [] },
  ])('when $text, then $expected', ({ text, expected }) => {
    expect(ids(text)).toEqual(expected);
  });
});

describe('cautionsForStage', () => {
  it.each([
    { stage: 'Delivery', expected: ['moving'] },
    { stage: 'Collection', expected: ['moving'] },
    { stage: 'Awaiting collection', expected: ['moving'] },
    { stage: 'Stringing', expected: [] },
    { stage: 'Refinishing', expected: [] },
    { stage: 'Assessment', expected: [] },
    { stage: null, expected: [] },
  ])('when the stage is $stage, then $expected', ({ stage, expected }) => {
    expect(cautionsForStage(stage).map((c) => c.id)).toEqual(expected);
  });
});

describe('cautionsForTask', () => {
  it('when a task sits in the Delivery stage, then moving is added to its own cautions, once', () => {
    expect(cautionsForTask('Tune on site', 'Delivery').map((c) => c.id)).toEqual(['moving']);
    expect(cautionsForTask('Deliver and tune', 'Delivery').map((c) => c.id)).toEqual(['moving']);
    expect(cautionsForTask('Pitch raise', 'Delivery').map((c) => c.id)).toEqual(['moving', 'restringing']);
  });

  it('when a task sits in a work stage, then only its title counts', () => {
    expect(cautionsForTask('Hang new hammers', 'Action')).toEqual([]);
    expect(cautionsForTask('Full restring, new tuning pins', 'Stringing').map((c) => c.id)).toEqual(['restringing']);
  });
});

describe('SAFETY_CAUTIONS', () => {
  it.each(SAFETY_CAUTIONS.map((c) => ({ id: c.id, caution: c })))('when $id, then one sentence, a source and a help anchor', ({ caution }) => {
    expect(caution.sentence.endsWith('.')).toBe(true);
    expect(caution.sentence.slice(0, -1)).not.toMatch(/[.!?]\s/);
    expect(caution.source).not.toBe('');
    expect(caution.helpAnchor).toMatch(/^[a-z-]+$/);
  });

  it('when each fact is read, then it names a TRADE.md §7 source or common practice', () => {
    const named = /\[S14[a-j]|HSE L23\/INDG143|Control of Lead at Work Regulations 2002|DSEAR 2002|HSG51|HSG258|^common practice$/;
    for (const caution of SAFETY_CAUTIONS) for (const fact of caution.facts) expect(fact.source).toMatch(named);
  });

  it('when moving, then the weights are those of [S14a]', () => {
    const moving = SAFETY_CAUTIONS.find((c) => c.id === 'moving');
    expect(moving?.sentence).toContain('220–270 kg');
    expect(moving?.sentence).toContain('540 kg');
    expect(moving?.source).toContain('HSE L23/INDG143');
  });
});
