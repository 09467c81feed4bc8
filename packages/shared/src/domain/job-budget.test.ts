import { describe, expect, it } from 'vitest';
import { remainingBudgetedMinutes, unbilledSubletMinor, unusedBudgetedPartsMinor } from './job-budget';

// Demo scenario: the Salon grand's tasks and parts. Minutes and quantities invented for these tests;
// costs from SCENARIO.md (grand hammer set £520.00, key bushing cloth £18.00/m).
describe('remainingBudgetedMinutes', () => {
  it('when tasks are part done, then each unfinished task adds its unused estimate', () => {
    const tasks = [
      { estimatedMinutes: 480, minutesToDate: 200, isDone: false }, // hang hammers: 280 left
      { estimatedMinutes: 720, minutesToDate: 800, isDone: false }, // rebush: over, 0 left
      { estimatedMinutes: 600, minutesToDate: 100, isDone: true }, // done early: nothing left
      { estimatedMinutes: null, minutesToDate: 30, isDone: false }, // no estimate: nothing
    ];
    expect(remainingBudgetedMinutes(tasks)).toBe(280);
  });

  it('when there are no tasks, then 0', () => {
    expect(remainingBudgetedMinutes([])).toBe(0);
  });
});

describe('unusedBudgetedPartsMinor', () => {
  it.each([
    { what: 'nothing used yet', used: 0, unused: 52000 + 4500 },
    { what: 'the hammers used, 1 m of 2.5 m cloth used', used: 1, unused: 2700 },
    { what: 'more cloth used than budgeted', used: 2, unused: 0 },
  ])('when $what, then $unused', ({ used }) => {
    const usage = [
      [0, 0],
      [1000, 1000],
      [1000, 3000],
    ][used]!;
    const parts = [
      { budgetedQuantityMilli: 1000, budgetedCostMinor: 52000, usedQuantityMilli: usage[0]! },
      { budgetedQuantityMilli: 2500, budgetedCostMinor: 4500, usedQuantityMilli: usage[1]! },
    ];
    expect(unusedBudgetedPartsMinor(parts)).toBe([56500, 2700, 0][used]);
  });

  it('when a third of a budget is left, then its cost rounds half-up per part', () => {
    // 100p for 3 units, 1 used: 66.67p → 67p
    expect(unusedBudgetedPartsMinor([{ budgetedQuantityMilli: 3000, budgetedCostMinor: 100, usedQuantityMilli: 1000 }])).toBe(67);
  });

  it('when a part was used with no budget, then it adds nothing', () => {
    expect(unusedBudgetedPartsMinor([{ budgetedQuantityMilli: 0, budgetedCostMinor: 0, usedQuantityMilli: 2000 }])).toBe(0);
  });
});

describe('unbilledSubletMinor', () => {
  it.each([
    { budget: 145000, billed: 0, left: 145000 },
    { budget: 145000, billed: 148000, left: 0 },
    { budget: 0, billed: 5000, left: 0 },
  ])('when budget $budget and billed $billed, then $left', ({ budget, billed, left }) => {
    expect(unbilledSubletMinor(budget, billed)).toBe(left);
  });
});
