import { describe, expect, it } from 'vitest';
import type { Estimate } from '@keybed/shared';
import { choicesOf, defaultChosenKeys, draftContent, draftFromEstimate, draftTotals, newLine, type EstimateDraft } from './estimate-draft';

/** Harriet Pembleton's Salon grand (SCENARIO.md): hammers new or recovered, rebush, regulation. */
const salon: EstimateDraft = {
  title: 'Salon grand: hammers, rebush, regulation',
  notes: '',
  options: [
    { key: 'new-hammers', choice: 'Hammers', name: 'New hammers' },
    { key: 'recover', choice: 'Hammers', name: 'Recover the old ones' },
  ],
  lines: [
    { uid: 'a', kind: 'labour', optionKey: null, description: 'Rebush keys', taskId: '', hours: '6:00', partId: '', quantity: '', unitPrice: '55.00', unitCost: '' },
    { uid: 'b', kind: 'part', optionKey: null, description: '', taskId: '', hours: '', partId: 'cloth', quantity: '2.5', unitPrice: '24.00', unitCost: '' },
    { uid: 'c', kind: 'part', optionKey: 'new-hammers', description: '', taskId: '', hours: '', partId: 'grand-hammers', quantity: '1', unitPrice: '690.00', unitCost: '' },
    { uid: 'd', kind: 'labour', optionKey: 'new-hammers', description: 'Hang and travel new hammers', taskId: '', hours: '12', partId: '', quantity: '', unitPrice: '55', unitCost: '' },
    { uid: 'e', kind: 'labour', optionKey: 'recover', description: 'Recover and reshape the old hammers', taskId: '', hours: '8:30', partId: '', quantity: '', unitPrice: '55', unitCost: '' },
  ],
};

describe('draftTotals', () => {
  it('when nothing is chosen yet, then the first option of each choice counts, with VAT once on the net', () => {
    const { totals, baseNet, optionNets } = draftTotals(salon, defaultChosenKeys(salon.options), 2000, 'GBP');
    // 6 h × £55 = £330 + 2.5 m × £24 = £60 → base £390; new hammers £690 + 12 h × £55 = £660 → £1,350.
    expect(baseNet).toBe(39000);
    expect(optionNets.get('new-hammers')).toBe(135000);
    expect(optionNets.get('recover')).toBe(46750);
    expect(totals).toEqual({ netMinor: 174000, taxMinor: 34800, grossMinor: 208800 });
  });

  it('when the other option is previewed, then only its lines count', () => {
    expect(draftTotals(salon, ['recover'], 2000, 'GBP').totals.netMinor).toBe(39000 + 46750);
  });

  it('when a line has a half-penny amount, then the line is rounded half-up before summing', () => {
    const draft = { ...salon, options: [], lines: [{ ...salon.lines[1]!, quantity: '0.125', unitPrice: '0.20', optionKey: null }] };
    // 0.125 × 20p = 2.5p → 3p; VAT 20 % of 3p = 0.6p → 1p.
    expect(draftTotals(draft, [], 2000, 'GBP').totals).toEqual({ netMinor: 3, taxMinor: 1, grossMinor: 4 });
  });

  it('when a line cannot be read yet, then it is left out and counted as unreadable', () => {
    const draft = { ...salon, lines: [...salon.lines, { ...salon.lines[0]!, uid: 'z', hours: 'soon' }] };
    const result = draftTotals(draft, defaultChosenKeys(salon.options), 2000, 'GBP');
    expect(result.unreadableCount).toBe(1);
    expect(result.lineAmounts.get('z')).toBeNull();
  });
});

describe('draftContent', () => {
  it('when the draft is complete, then lines go to the API in minutes, thousandths and minor units', () => {
    const result = draftContent(salon, 'GBP', false);
    expect(result.data?.lines[0]).toEqual({ optionKey: null, kind: 'labour', description: 'Rebush keys', taskId: null, minutes: 360, unitPriceMinor: 5500 });
    expect(result.data?.lines[1]).toEqual({ optionKey: null, kind: 'part', partId: 'cloth', quantityMilli: 2500, unitPriceMinor: 2400 });
    expect(result.data?.lines[4]).toMatchObject({ minutes: 510, optionKey: 'recover' });
  });

  it('when lines are wrong, then each problem is keyed like the API field errors', () => {
    const draft = { ...salon, lines: [{ ...salon.lines[0]!, hours: 'x', description: ' ' }, { ...salon.lines[1]!, partId: '' }] };
    expect(Object.keys(draftContent(draft, 'GBP', false).fields ?? {}).sort()).toEqual(['lines.0.description', 'lines.0.minutes', 'lines.1.partId']);
  });

  it('when a choice has one option, then the choice is refused', () => {
    const draft = { ...salon, options: [salon.options[0]!], lines: [] };
    expect(draftContent(draft, 'GBP', false).fields).toEqual({ 'options.0.choice': ['A choice needs at least two options'] });
  });

  it('when a sublet line has a cost, then only the owner sends it', () => {
    const refinish = { uid: 's', kind: 'sublet' as const, optionKey: null, description: 'Black polyester refinish (sublet to Heathside Finishers)', taskId: '', hours: '', partId: '', quantity: '1', unitPrice: '1850', unitCost: '1450' };
    const draft = { ...salon, options: [], lines: [refinish] };
    expect(draftContent(draft, 'GBP', true).data?.lines[0]).toMatchObject({ unitPriceMinor: 185000, unitCostMinor: 145000 });
    expect(draftContent(draft, 'GBP', false).data?.lines[0]).not.toHaveProperty('unitCostMinor');
  });
});

describe('draft helpers', () => {
  it('when options share a choice in any case, then they are one choice', () => {
    expect(choicesOf([{ key: 'a', choice: 'Case', name: 'Revive' }, { key: 'b', choice: 'case', name: 'Refinish' }]).map((c) => c.options.length)).toEqual([2]);
  });

  it('when a labour line is added, then it is priced at the charge-out rate', () => {
    expect(newLine('labour', null, { labourRateMinorPerHour: 5500, currency: 'GBP' })).toMatchObject({ unitPrice: '55.00', quantity: '' });
    expect(newLine('part', 'x', { part: { id: 'p', name: 'Shellac flakes', unit: 'kg', sellPriceMinor: 4800 }, currency: 'GBP' })).toMatchObject({ partId: 'p', unitPrice: '48.00', quantity: '1', optionKey: 'x' });
  });

  it('when a stored estimate is opened, then its lines read back as typed text', () => {
    const estimate = {
      title: 'Case',
      notes: '',
      options: [],
      lines: [{ id: 'l1', kind: 'labour', description: 'Test patch', task: { id: 't1', title: 'Test patch' }, part: null, minutes: 90, quantityMilli: null, optionKey: null, unitPriceMinor: 5500, unitCostMinor: null }],
    } as unknown as Estimate;
    expect(draftFromEstimate(estimate, 'GBP').lines[0]).toMatchObject({ id: 'l1', hours: '1:30', taskId: 't1', unitPrice: '55.00', unitCost: '' });
  });
});
