import { describe, expect, it } from 'vitest';
import type { CatalogueOperation, EstimateProposal } from '@keybed/shared';
import { blankLine, buildEstimateInput, draftLineOf, initialItems, optionsFromChoices, suggestOptionKey, tickedLabourMinutes, type DraftItem } from './estimate-proposal';

const operation = (id: string, name: string, labourMinutes = 60): CatalogueOperation => ({
  id,
  name,
  description: '',
  pianoType: 'grand',
  componentKeys: [],
  isActive: true,
  lines: [{ kind: 'labour', description: name, minutes: labourMinutes, part: null, quantityMilli: null, supplier: null }],
  labourMinutes,
  version: 1,
  updatedAt: '2026-03-02T10:00:00Z',
});

const hammers = operation('op-hammers', 'Replace hammer set (grand)', 960);
const rebush = operation('op-rebush', 'Rebush keys', 600);
const tidy = operation('op-tidy', 'Case tidy', 480);
const refinish = operation('op-refinish', 'Full refinish in black polyester', 120);
const regulation = operation('op-regulation', 'Full regulation', 720);

const choices = [{ choice: 'Case', alternatives: ['Revive the shellac', 'Strip and refinish'] }];

const proposal: EstimateProposal = {
  surveyId: 'survey-1',
  jobId: null,
  choices,
  components: [
    { componentId: 'c-hammers', key: 'hammers', area: 'Action', name: 'Hammers', grade: 'replace', note: 'Deep grooves', operations: [hammers, regulation] },
    { componentId: 'c-bushings', key: 'key-bushings', area: 'Keys', name: 'Keys and key bushings', grade: 'needs_work', note: '', operations: [rebush] },
    { componentId: 'c-regulation', key: 'regulation', area: 'Regulation', name: 'Regulation', grade: 'needs_work', note: '', operations: [regulation] },
    { componentId: 'c-case', key: 'case-finish', area: 'Case', name: 'Case and finish', grade: 'needs_work', note: '', operations: [tidy, refinish] },
  ],
};

describe('optionsFromChoices and suggestOptionKey', () => {
  it('when the summary names the case alternatives, then each becomes an option keyed by position', () => {
    expect(optionsFromChoices(choices)).toEqual([
      { key: 'choice1-1', choice: 'Case', name: 'Revive the shellac' },
      { key: 'choice1-2', choice: 'Case', name: 'Strip and refinish' },
    ]);
  });

  it('when an operation shares a word with one alternative, then it is suggested for it; no shared word, no suggestion', () => {
    const options = optionsFromChoices(choices);
    expect(suggestOptionKey('Full refinish in black polyester', options)).toBe('choice1-2');
    expect(suggestOptionKey('Case tidy', options)).toBe('');
  });

  it('when the only shared word is the choice’s own name, then nothing is suggested', () => {
    const options = optionsFromChoices([{ choice: 'Hammers', alternatives: ['New hammers', 'Recover the hammers'] }]);
    expect(suggestOptionKey('Hammer shanks', options)).toBe('');
    expect(suggestOptionKey('Recover hammers', options)).toBe('choice1-2');
  });
});

describe('initialItems', () => {
  it('when an operation remedies two components, then it appears once with both', () => {
    const items = initialItems(proposal);
    expect(items.map((i) => i.operationId)).toEqual(['op-hammers', 'op-regulation', 'op-rebush', 'op-tidy', 'op-refinish']);
    expect(items.find((i) => i.operationId === 'op-regulation')?.componentIds).toEqual(['c-hammers', 'c-regulation']);
  });

  it('when a component has one remedy, or a remedy matches an alternative, then it starts ticked; others wait for the assessor', () => {
    const ticked = Object.fromEntries(initialItems(proposal).map((i) => [i.operationId, [i.isTicked, i.optionKey]]));
    expect(ticked).toEqual({
      'op-hammers': [false, ''],
      'op-regulation': [true, ''],
      'op-rebush': [true, ''],
      'op-tidy': [false, ''],
      'op-refinish': [true, 'choice1-2'],
    });
  });
});

describe('buildEstimateInput', () => {
  const items = (): DraftItem[] => initialItems(proposal);

  it('when work is put in one case alternative, then both case options go in and untouched operations go by id', () => {
    const result = buildEstimateInput(items(), choices, { title: '', notes: '' }, 'GBP');
    expect(result).toEqual({
      ok: true,
      input: {
        notes: '',
        options: optionsFromChoices(choices),
        items: [
          { componentIds: ['c-hammers', 'c-regulation'], optionKey: null, operationId: 'op-regulation' },
          { componentIds: ['c-bushings'], optionKey: null, operationId: 'op-rebush' },
          { componentIds: ['c-case'], optionKey: 'choice1-2', operationId: 'op-refinish' },
        ],
      },
    });
  });

  it('when no work is put in a choice, then its options are left out', () => {
    const plain = items().map((i) => ({ ...i, optionKey: '' }));
    const result = buildEstimateInput(plain, choices, { title: 'New hammers and regulation', notes: '' }, 'GBP');
    expect(result.ok && result.input.options).toEqual([]);
    expect(result.ok && result.input.title).toBe('New hammers and regulation');
  });

  it('when lines were edited, then they are sent with hours as minutes and prices in pence', () => {
    const edited = items().map((i) =>
      i.operationId === 'op-tidy'
        ? { ...i, isTicked: true, optionKey: 'choice1-1', lines: [{ ...draftLineOf(tidy.lines[0]!, 'GBP'), hoursText: '7:30' }, { ...blankLine('other'), description: 'Shellac, 0.5 kg', priceText: '24.00' }] }
        : i,
    );
    const result = buildEstimateInput(edited, choices, { title: '', notes: '' }, 'GBP');
    expect(result.ok && result.input.items.find((i) => i.operationId === 'op-tidy')).toEqual({
      componentIds: ['c-case'],
      optionKey: 'choice1-1',
      operationId: 'op-tidy',
      lines: [
        { kind: 'labour', description: 'Case tidy', minutes: 450 },
        { kind: 'other', description: 'Shellac, 0.5 kg', quantityMilli: 1000, unitPriceMinor: 2400 },
      ],
    });
    expect(tickedLabourMinutes(edited, new Map([tidy, regulation, rebush, refinish].map((o) => [o.id, o])))).toBe(450 + 720 + 600 + 120);
  });

  it('when an edited line cannot be read, then the field says why and nothing is built', () => {
    const added: DraftItem = { id: 'added-1', operationId: null, name: 'Clean the soundboard', componentIds: [], isTicked: true, optionKey: '', lines: [{ ...blankLine('labour'), description: 'Clean the soundboard', hoursText: 'two' }] };
    const result = buildEstimateInput([added], choices, { title: '', notes: '' }, 'GBP');
    expect(result).toEqual({ ok: false, fields: { 'items.added-1.lines.0.hours': ['Write hours and minutes like 1:30, or hours like 1.5'] }, problems: [] });
  });

  it('when nothing is ticked, then it asks for work', () => {
    const none = items().map((i) => ({ ...i, isTicked: false }));
    expect(buildEstimateInput(none, choices, { title: '', notes: '' }, 'GBP')).toEqual({ ok: false, fields: {}, problems: ['Tick at least one piece of work'] });
  });
});
