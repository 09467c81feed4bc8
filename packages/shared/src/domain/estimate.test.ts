import { describe, expect, it } from 'vitest';
import {
  defaultOptionIds,
  estimateLineAmountMinor,
  estimateLineCostMinor,
  estimateTotals,
  linesInScope,
  optionChoiceProblems,
  type EstimateLineFigures,
} from './estimate';

// Prices from the demo scenario (SCENARIO.md): labour £55/h; grand hammer set £690.00 sell, £520.00
// cost; key bushing cloth £24.00/m; black polyester refinish sublet £1,850.00 price, £1,450.00 cost.
const line = (over: Partial<EstimateLineFigures>): EstimateLineFigures => ({
  kind: 'other',
  minutes: null,
  quantityMilli: 1000,
  unitPriceMinor: 0,
  unitCostMinor: null,
  optionId: null,
  ...over,
});

const options = [
  { id: 'new-hammers', choice: 'Hammers' },
  { id: 'recover-hammers', choice: 'Hammers' },
  { id: 'revive-shellac', choice: 'Case' },
  { id: 'strip-refinish', choice: 'Case' },
];

const salonGrand: EstimateLineFigures[] = [
  line({ kind: 'labour', minutes: 720, quantityMilli: null, unitPriceMinor: 5500 }), // rebush and regulate, 12 h
  line({ kind: 'part', quantityMilli: 2500, unitPriceMinor: 2400, unitCostMinor: 1800 }), // bushing cloth 2.5 m
  line({ kind: 'part', quantityMilli: 1000, unitPriceMinor: 69000, unitCostMinor: 52000, optionId: 'new-hammers' }),
  line({ kind: 'labour', minutes: 480, quantityMilli: null, unitPriceMinor: 5500, optionId: 'new-hammers' }),
  line({ kind: 'labour', minutes: 900, quantityMilli: null, unitPriceMinor: 5500, optionId: 'recover-hammers' }),
  line({ kind: 'labour', minutes: 600, quantityMilli: null, unitPriceMinor: 5500, optionId: 'revive-shellac' }),
  line({ kind: 'sublet', quantityMilli: 1000, unitPriceMinor: 185000, unitCostMinor: 145000, optionId: 'strip-refinish' }),
];

describe('estimateLineAmountMinor', () => {
  it.each([
    { what: '12 h labour at £55/h', l: line({ kind: 'labour', minutes: 720, quantityMilli: null, unitPriceMinor: 5500 }), amount: 66000 },
    { what: '7 min at £55/h = 641.67p', l: line({ kind: 'labour', minutes: 7, quantityMilli: null, unitPriceMinor: 5500 }), amount: 642 },
    { what: '1 min at £0.30/h = 0.5p, half-up', l: line({ kind: 'labour', minutes: 1, quantityMilli: null, unitPriceMinor: 30 }), amount: 1 },
    { what: '2.5 m cloth at £24.00', l: line({ kind: 'part', quantityMilli: 2500, unitPriceMinor: 2400 }), amount: 6000 },
    { what: '0.5 × 5p = 2.5p, half-up', l: line({ quantityMilli: 500, unitPriceMinor: 5 }), amount: 3 },
    { what: '0.5 × 3p = 1.5p, half-up', l: line({ quantityMilli: 500, unitPriceMinor: 3 }), amount: 2 },
    { what: '0.499 × 1p = 0.499p', l: line({ quantityMilli: 499, unitPriceMinor: 1 }), amount: 0 },
  ])('when $what, then $amount', ({ l, amount }) => {
    expect(estimateLineAmountMinor(l)).toBe(amount);
  });
});

describe('estimateLineCostMinor', () => {
  it('when a part or sublet has a unit cost, then quantity × cost; labour and unknown costs are null', () => {
    expect(estimateLineCostMinor(salonGrand[1]!)).toBe(4500);
    expect(estimateLineCostMinor(salonGrand[6]!)).toBe(145000);
    expect(estimateLineCostMinor(salonGrand[0]!)).toBeNull();
    expect(estimateLineCostMinor(line({ unitPriceMinor: 100 }))).toBeNull();
  });
});

describe('options', () => {
  it('when nothing is chosen yet, then the first option of each choice is in scope', () => {
    expect(defaultOptionIds(options)).toEqual(['new-hammers', 'revive-shellac']);
  });

  it.each([
    { chosen: ['new-hammers', 'strip-refinish'], problems: [] },
    { chosen: ['new-hammers'], problems: ['Choose an option for "Case"'] },
    { chosen: ['new-hammers', 'recover-hammers', 'revive-shellac'], problems: ['Choose only one option for "Hammers"'] },
    { chosen: ['new-hammers', 'revive-shellac', 'elsewhere'], problems: ['Choose only options of this estimate'] },
  ])('when $chosen are chosen, then $problems', ({ chosen, problems }) => {
    expect(optionChoiceProblems(options, chosen)).toEqual(problems);
  });

  it('when an estimate has no options, then choosing none is valid', () => {
    expect(optionChoiceProblems([], [])).toEqual([]);
  });

  it('when lines are filtered by choice, then always-included and chosen lines remain', () => {
    expect(linesInScope(salonGrand, ['recover-hammers', 'strip-refinish'])).toHaveLength(4);
  });
});

describe('estimateTotals', () => {
  it('when new hammers and strip-and-refinish are chosen, then net, 20 % VAT on the net, gross', () => {
    // 66 000 + 6 000 + 69 000 + 44 000 + 185 000 = 370 000p; VAT 20 % [S19a] = 74 000p.
    expect(estimateTotals(salonGrand, ['new-hammers', 'strip-refinish'], 2000)).toEqual({ netMinor: 370000, taxMinor: 74000, grossMinor: 444000 });
  });

  it('when recover and revive are chosen, then the other lines count', () => {
    // 66 000 + 6 000 + 82 500 + 55 000 = 209 500p
    expect(estimateTotals(salonGrand, ['recover-hammers', 'revive-shellac'], 2000)).toEqual({ netMinor: 209500, taxMinor: 41900, grossMinor: 251400 });
  });

  it('when many half-penny lines, then each line rounds before summing and tax rounds once on the net', () => {
    // 101 lines of 0.5 × 3p = 1.5p → 2p each = 202p; VAT 20 % = 40.4p → 40p. Rounding the sum
    // instead (151.5p → 152p) would give a different net: the rule is per line.
    const lines = Array.from({ length: 101 }, () => line({ quantityMilli: 500, unitPriceMinor: 3 }));
    expect(estimateTotals(lines, [], 2000)).toEqual({ netMinor: 202, taxMinor: 40, grossMinor: 242 });
  });

  it('when VAT on the net is a half penny, then half-up gives the higher penny and down the lower [S19b]', () => {
    // 12.5p net × 20 % = 2.5p; VATREC12010 allows rounding total VAT down, Keybed rounds half-up.
    const lines = [line({ quantityMilli: 500, unitPriceMinor: 25 })]; // 12.5p → 13p net
    expect(estimateTotals(lines, [], 2000).taxMinor).toBe(3); // 2.6p → 3p
    expect(estimateTotals([line({ quantityMilli: 1000, unitPriceMinor: 5 })], [], 5000)).toEqual({ netMinor: 5, taxMinor: 3, grossMinor: 8 }); // 2.5p → 3p
    expect(estimateTotals([line({ quantityMilli: 1000, unitPriceMinor: 5 })], [], 5000, 'down').taxMinor).toBe(2);
  });
});
