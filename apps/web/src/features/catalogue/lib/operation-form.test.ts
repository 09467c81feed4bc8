import { describe, expect, it } from 'vitest';
import type { CatalogueOperation } from '@keybed/shared';
import { EMPTY_OPERATION, blankLineDraft, draftOf, toOperationChanges, toOperationInput, type OperationDraft } from './operation-form';

const HAMMER_SET = '5b0e3f84-6c2a-4d15-9b3e-3f8a0c2d4e01';

// The scenario's "replace hammer set (grand)": hang and voice, the Larkspur Felts set, nothing sent out.
const hammers: OperationDraft = {
  name: 'Replace hammer set (grand)',
  description: 'New hammers hung, travelled and voiced',
  pianoType: 'grand',
  componentKeys: ['hammers'],
  isActive: true,
  lines: [
    { ...blankLineDraft('labour'), description: 'Hang and travel new hammers', hoursText: '12:30' },
    { ...blankLineDraft('part'), partId: HAMMER_SET, quantityText: '1' },
  ],
};

describe('toOperationInput', () => {
  it('when hours are typed as h:mm and the part as a quantity, then the API gets minutes and thousandths', () => {
    expect(toOperationInput(hammers, 'GBP')).toEqual({
      ok: true,
      input: {
        name: 'Replace hammer set (grand)',
        description: 'New hammers hung, travelled and voiced',
        pianoType: 'grand',
        componentKeys: ['hammers'],
        isActive: true,
        lines: [
          { kind: 'labour', description: 'Hang and travel new hammers', minutes: 750 },
          { kind: 'part', partId: HAMMER_SET, quantityMilli: 1000 },
        ],
      },
    });
  });

  it('when refinishing is sent out, then price and cost go in pence and an empty cost is left out', () => {
    const refinish = { ...EMPTY_OPERATION, name: 'Full refinish in black polyester', lines: [{ ...blankLineDraft('sublet'), description: 'Black polyester refinish', supplier: 'Heathside Finishers', priceText: '1,850.00', costText: '1450' }] };
    expect(toOperationInput(refinish, 'GBP')).toMatchObject({ ok: true, input: { pianoType: null, lines: [{ kind: 'sublet', quantityMilli: 1000, unitPriceMinor: 185_000, unitCostMinor: 145_000, supplier: 'Heathside Finishers' }] } });
    const noCost = { ...refinish, lines: [{ ...refinish.lines[0]!, costText: '' }] };
    const result = toOperationInput(noCost, 'GBP');
    expect(result.ok && result.input.lines[0]).not.toHaveProperty('unitCostMinor');
  });

  it('when a line cannot be read and the name is missing, then each problem is on its own field', () => {
    const bad = { ...hammers, name: ' ', lines: [{ ...hammers.lines[0]!, hoursText: 'soon', description: '' }, { ...hammers.lines[1]!, partId: '' }] };
    expect(toOperationInput(bad, 'GBP')).toEqual({
      ok: false,
      fields: {
        name: ['Name is required'],
        'lines.0.minutes': ['Write hours and minutes like 1:30, or hours like 1.5'],
        'lines.0.description': ['Task is required'],
        'lines.1.partId': ['Choose a part'],
      },
    });
  });

  it('when there are no lines, then it asks for one', () => {
    expect(toOperationInput({ ...hammers, lines: [] }, 'GBP')).toEqual({ ok: false, fields: { lines: ['Add at least one line'] } });
  });
});

describe('toOperationChanges', () => {
  it('when only the name changed, then the lines are not sent back (a foreman cannot see sublet costs to keep them)', () => {
    const result = toOperationChanges({ ...hammers, name: 'Replace hammers (grand)' }, hammers, 3, 'GBP');
    expect(result.ok && result.changes).toMatchObject({ version: 3, name: 'Replace hammers (grand)' });
    expect(result.ok && result.changes).not.toHaveProperty('lines');
  });

  it('when a line changed, then the whole list is sent', () => {
    const edited = { ...hammers, lines: [{ ...hammers.lines[0]!, hoursText: '14' }, hammers.lines[1]!] };
    expect(toOperationChanges(edited, hammers, 3, 'GBP')).toMatchObject({ ok: true, changes: { lines: [{ minutes: 840 }, { quantityMilli: 1000 }] } });
  });
});

describe('draftOf', () => {
  it('when an operation comes from the API, then hours show as h:mm and sublet money as decimals', () => {
    const op: CatalogueOperation = {
      id: 'op-1',
      name: 'Full refinish in black polyester',
      description: '',
      pianoType: null,
      componentKeys: ['case-finish'],
      isActive: true,
      lines: [
        { kind: 'labour', description: 'Strip the action out', minutes: 90, part: null, quantityMilli: null, supplier: null },
        { kind: 'sublet', description: 'Black polyester refinish', minutes: null, part: null, quantityMilli: 1000, supplier: 'Heathside Finishers', unitPriceMinor: 185_000, unitCostMinor: 145_000 },
      ],
      labourMinutes: 90,
      version: 2,
      updatedAt: '2026-03-02T10:00:00Z',
    };
    const draft = draftOf(op, 'GBP');
    expect(draft.lines.map((l) => [l.hoursText, l.quantityText, l.priceText, l.costText])).toEqual([
      ['1:30', '1', '', ''],
      ['', '1', '1850.00', '1450.00'],
    ]);
    expect(toOperationChanges(draft, draft, 2, 'GBP')).toMatchObject({ ok: true, changes: { pianoType: null } });
  });
});
