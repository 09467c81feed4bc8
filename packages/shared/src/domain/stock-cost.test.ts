import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EMPTY_STOCK, averageUnitCostMinor, issueStock, issueStockAllowingShortfall, receiveStock } from './stock-cost';

// Weighted average cost is a permitted cost formula under IAS 2 (¶25 from memory; TRADE.md §8).
describe('moving weighted-average cost (IAS 2, from memory)', () => {
  it('when 10 @ £5 then 10 @ £7, use 5, receive 5 @ £8, then average £6, issue £30, new average £6.50', () => {
    let stock = receiveStock(EMPTY_STOCK, 10_000, 500);
    stock = receiveStock(stock, 10_000, 700);
    expect(stock).toEqual({ quantityMilli: 20_000, valueMinor: 12_000 });
    expect(averageUnitCostMinor(stock)).toBe(600);

    const issued = issueStock(stock, 5_000);
    expect(issued.costMinor).toBe(3_000);
    expect(issued.stock).toEqual({ quantityMilli: 15_000, valueMinor: 9_000 });

    stock = receiveStock(issued.stock, 5_000, 800);
    expect(stock).toEqual({ quantityMilli: 20_000, valueMinor: 13_000 });
    expect(averageUnitCostMinor(stock)).toBe(650);
  });

  it.each([
    // Key bushing cloth (scenario £18.00/m), then a dearer roll at £19.50/m.
    { steps: [['in', 5_000, 1800], ['in', 3_000, 1950], ['out', 2_500]], cost: 4641, left: { quantityMilli: 5_500, valueMinor: 10209 }, average: 1856 },
    // 3 @ £1.00 then issue 1 of 3: 100p exactly, no residue.
    { steps: [['in', 3_000, 100], ['out', 1_000]], cost: 100, left: { quantityMilli: 2_000, valueMinor: 200 }, average: 100 },
    // 3 units worth £1.00 in total: issue 1 → 33.3p → 33p; the 2 left keep 67p (33.5p each → 34p shown).
    { steps: [['in', 2_000, 33], ['in', 1_000, 34], ['out', 1_000]], cost: 33, left: { quantityMilli: 2_000, valueMinor: 67 }, average: 34 },
  ] as const)('when $steps, then last issue costs $cost', ({ steps, cost, left, average }) => {
    let stock = EMPTY_STOCK;
    let lastCost = 0;
    for (const step of steps) {
      if (step[0] === 'in') stock = receiveStock(stock, step[1], step[2]);
      else ({ stock, costMinor: lastCost } = issueStock(stock, step[1]));
    }
    expect(lastCost).toBe(cost);
    expect(stock).toEqual(left);
    expect(averageUnitCostMinor(stock)).toBe(average);
  });

  it('when everything is issued, then the cost is exactly the value and nothing remains', () => {
    const stock = receiveStock(receiveStock(EMPTY_STOCK, 1_000, 333), 2_000, 334);
    expect(issueStock(stock, 3_000)).toEqual({ stock: EMPTY_STOCK, costMinor: 1001 });
  });

  it('when empty, then no average', () => {
    expect(averageUnitCostMinor(EMPTY_STOCK)).toBeNull();
  });

  it.each([
    { action: () => issueStock(EMPTY_STOCK, 1_000), why: 'more than on hand' },
    { action: () => issueStock(receiveStock(EMPTY_STOCK, 1_000, 1), 0), why: 'zero issue' },
    { action: () => receiveStock(EMPTY_STOCK, -1_000, 500), why: 'negative receipt' },
  ])('when $why, then RangeError', ({ action }) => {
    expect(action).toThrow(RangeError);
  });

  it('when any receipts and issues, then value stays ≥ 0 and total issued + held = total received (property)', () => {
    const op = fc.oneof(
      fc.record({ kind: fc.constant('in' as const), q: fc.integer({ min: 1, max: 50_000 }), cost: fc.integer({ min: 0, max: 100_000 }) }),
      fc.record({ kind: fc.constant('out' as const), fraction: fc.double({ min: 0, max: 1, noNaN: true }) }),
    );
    fc.assert(
      fc.property(fc.array(op, { maxLength: 40 }), (ops) => {
        let stock = EMPTY_STOCK;
        let received = 0;
        let issued = 0;
        for (const o of ops) {
          if (o.kind === 'in') {
            const before = stock.valueMinor;
            stock = receiveStock(stock, o.q, o.cost);
            received += stock.valueMinor - before;
          } else {
            const q = Math.floor(stock.quantityMilli * o.fraction);
            if (q === 0) continue;
            const result = issueStock(stock, q);
            issued += result.costMinor;
            stock = result.stock;
          }
          expect(stock.valueMinor).toBeGreaterThanOrEqual(0);
        }
        expect(issued + stock.valueMinor).toBe(received);
      }),
    );
  });
});

describe('issueStockAllowingShortfall', () => {
  it('when enough is on hand, then it is the ordinary weighted-average issue', () => {
    const stock = receiveStock(EMPTY_STOCK, 4000, 9500); // 4 damper felt sets at £95 (scenario)
    expect(issueStockAllowingShortfall(stock, 1000, 1)).toEqual(issueStock(stock, 1000));
  });

  it('when 1 is on hand and 3 are issued, then the one costs its value and the shortfall the average', () => {
    const stock = receiveStock(EMPTY_STOCK, 1000, 6200); // one box of tuning pins at £62
    expect(issueStockAllowingShortfall(stock, 3000, 9999)).toEqual({ stock: { quantityMilli: -2000, valueMinor: -12400 }, costMinor: 18600 });
  });

  it('when nothing is on hand, then the shortfall costs the catalogue price', () => {
    expect(issueStockAllowingShortfall(EMPTY_STOCK, 1500, 1450)).toEqual({ stock: { quantityMilli: -1500, valueMinor: -2175 }, costMinor: 2175 });
  });

  it('when the quantity is not positive, then RangeError', () => {
    expect(() => issueStockAllowingShortfall(EMPTY_STOCK, 0, 100)).toThrow(RangeError);
  });
});
