import { describe, expect, it } from 'vitest';
import {
  completionEstimates,
  costPerformanceIndex,
  costVarianceMinor,
  estimateAtCompletionMinor,
  schedulePerformanceIndex,
  scheduleVarianceMinor,
} from './earned-value';

// Formulas: GAO-20-195G Cost Estimating and Assessment Guide [S18]. Check values: TRADE.md §8,
// derived from [S18]: BAC £4,000, EV £2,000, AC £2,500, PV £2,400.
const worked = { bacMinor: 400000, pvMinor: 240000, evMinor: 200000, acMinor: 250000 };

describe('earned value, worked example (GAO-20-195G [S18], derived)', () => {
  it('when EV £2,000 and AC £2,500, then CV −£500 and CPI 0.80', () => {
    expect(costVarianceMinor(worked)).toBe(-50000);
    expect(costPerformanceIndex(worked)).toBe(0.8);
  });

  it('when EV £2,000 and PV £2,400, then SV −£400 and SPI 0.833', () => {
    expect(scheduleVarianceMinor(worked)).toBe(-40000);
    expect(schedulePerformanceIndex(worked)).toBeCloseTo(0.833, 3);
  });

  it.each([
    { method: 'cpi' as const, eac: 500000, etc: 250000, vac: -100000 },
    { method: 'budget-rate' as const, eac: 450000, etc: 200000, vac: -50000 },
    { method: 'cpi-spi' as const, eac: 550000, etc: 300000, vac: -150000 },
  ])('when EAC by $method, then EAC $eac, ETC $etc and VAC $vac (minor units)', ({ method, eac, etc, vac }) => {
    expect(estimateAtCompletionMinor(worked, method)).toBe(eac);
    expect(completionEstimates(worked).find((e) => e.method === method)).toEqual({
      method,
      eacMinor: eac,
      etcMinor: etc,
      vacMinor: vac,
    });
  });
});

describe('earned value, edges', () => {
  it('when nothing is spent or planned yet, then indices are null and only the budget-rate EAC is given', () => {
    const fresh = { bacMinor: 400000, pvMinor: 0, evMinor: 0, acMinor: 0 };
    expect(costPerformanceIndex(fresh)).toBeNull();
    expect(schedulePerformanceIndex(fresh)).toBeNull();
    expect(completionEstimates(fresh)).toEqual([{ method: 'budget-rate', eacMinor: 400000, etcMinor: 400000, vacMinor: 0 }]);
  });

  it('when money is spent but nothing earned, then CPI is 0 and the CPI-based EACs are undefined', () => {
    const stuck = { bacMinor: 400000, pvMinor: 100000, evMinor: 0, acMinor: 50000 };
    expect(costPerformanceIndex(stuck)).toBe(0);
    expect(estimateAtCompletionMinor(stuck, 'cpi')).toBeNull();
    expect(estimateAtCompletionMinor(stuck, 'cpi-spi')).toBeNull();
    expect(estimateAtCompletionMinor(stuck, 'budget-rate')).toBe(450000);
  });

  it('when the EAC is fractional, then it rounds half away from zero to the penny', () => {
    // BAC·AC/EV = 100 000 × 33 333 / 30 000 = 111 110p exactly; 100 001 → 111 111.111p → 111 111p.
    expect(estimateAtCompletionMinor({ bacMinor: 100000, pvMinor: 1, evMinor: 30000, acMinor: 33333 }, 'cpi')).toBe(111110);
    expect(estimateAtCompletionMinor({ bacMinor: 100001, pvMinor: 1, evMinor: 30000, acMinor: 33333 }, 'cpi')).toBe(111111);
  });

  it('when on plan and on budget, then every EAC equals BAC', () => {
    const onPlan = { bacMinor: 400000, pvMinor: 200000, evMinor: 200000, acMinor: 200000 };
    expect(completionEstimates(onPlan).map((e) => e.eacMinor)).toEqual([400000, 400000, 400000]);
  });
});
