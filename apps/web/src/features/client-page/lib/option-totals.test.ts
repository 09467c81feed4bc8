import { describe, expect, it } from 'vitest';
import type { ClientPage } from '@keybed/shared';
import { differenceMinor, initialPicks, pickedIds, totalsFor } from './option-totals';

// Harriet Pembleton's Salon grand (invented scenario): hammers, rebushing and regulation always,
// and the case either revived (shellac) or sent out to be refinished.
const estimate: ClientPage['estimate'] = {
  id: 'est-1',
  revision: 1,
  title: 'New hammers, rebush keys, full regulation',
  notes: '',
  status: 'issued',
  currency: 'GBP',
  taxRateBasisPoints: 2000,
  includedLines: [
    { description: 'Hang new hammers', quantityText: '16 h', amountMinor: 88_000 },
    { description: 'Hammer set, grand, 88', quantityText: '1 set', amountMinor: 69_000 },
    { description: 'Rebush keys', quantityText: '10 h', amountMinor: 55_000 },
  ],
  choices: [
    {
      choice: 'Case',
      options: [
        { id: 'opt-shellac', name: 'Revive the shellac', netMinor: 48_800, isChosen: false, lines: [] },
        { id: 'opt-refinish', name: 'Strip and refinish', netMinor: 185_000, isChosen: false, lines: [] },
      ],
    },
  ],
  totals: { netMinor: 260_800, taxMinor: 52_160, grossMinor: 312_960 },
  issuedAt: '2026-03-02T10:00:00Z',
};

describe('option totals on the client’s page', () => {
  it('when nothing is picked yet, then the first option of each choice gives the same totals as the estimate', () => {
    const picks = initialPicks(estimate);
    expect(picks).toEqual({ Case: 'opt-shellac' });
    expect(totalsFor(estimate, picks)).toEqual(estimate.totals);
  });

  it('when the refinish is picked, then net, VAT at 20 % and total follow', () => {
    // Net 212,000 + 185,000 = 397,000; VAT 79,400; total 476,400.
    expect(totalsFor(estimate, { Case: 'opt-refinish' })).toEqual({ netMinor: 397_000, taxMinor: 79_400, grossMinor: 476_400 });
    expect(differenceMinor(estimate, { Case: 'opt-shellac' }, 'Case', 'opt-refinish')).toBe(476_400 - 312_960);
  });

  it('when VAT comes to a fraction of a penny, then it is rounded once on the total net, to the nearest penny', () => {
    const odd = (amountMinor: number) => ({ ...estimate, includedLines: [{ description: 'Tuning', quantityText: '1', amountMinor }], choices: [] });
    // 12,347 × 20 % = 2,469.4 → 2,469; 12,348 × 20 % = 2,469.6 → 2,470.
    expect(totalsFor(odd(12_347), {}).taxMinor).toBe(2_469);
    expect(totalsFor(odd(12_348), {}).taxMinor).toBe(2_470);
  });

  it('when the estimate was accepted, then the chosen options are picked, and unknown picks are ignored', () => {
    const accepted = { ...estimate, choices: [{ ...estimate.choices[0]!, options: estimate.choices[0]!.options.map((o) => ({ ...o, isChosen: o.id === 'opt-refinish' })) }] };
    expect(initialPicks(accepted)).toEqual({ Case: 'opt-refinish' });
    expect(pickedIds(estimate, { Case: 'someone-else' })).toEqual([]);
  });
});
