import { describe, expect, it } from 'vitest';
import { averageRateMinorPerHour, entryCostMinor, labourCost, partsCostMinor, rateInForce } from './costing';

// Rates from the demo scenario: Priya £24/h, Declan £22/h, Ana £20/h (cost rates). Priya's rise to
// £25/h on 1 April 2026 and Ana's start date are invented for these tests.
const LONDON = 'Europe/London';
const rates = {
  priya: [
    { effectiveFrom: '2026-04-01', rateMinorPerHour: 2500 },
    { effectiveFrom: '2025-01-06', rateMinorPerHour: 2400 },
  ],
  declan: [{ effectiveFrom: '2025-01-06', rateMinorPerHour: 2200 }],
  ana: [{ effectiveFrom: '2026-04-06', rateMinorPerHour: 2000 }],
};

describe('rateInForce', () => {
  it.each([
    { day: '2026-03-31', rate: 2400, why: 'day before the rise' },
    { day: '2026-04-01', rate: 2500, why: 'the rise starts that day' },
    { day: '2027-01-01', rate: 2500, why: 'latest period runs on' },
    { day: '2025-01-05', rate: null, why: 'before any period' },
  ])('when $day, then $rate ($why)', ({ day, rate }) => {
    expect(rateInForce(rates.priya, day)).toBe(rate);
  });

  it('when there are no periods, then null', () => {
    expect(rateInForce([], '2026-04-01')).toBeNull();
  });
});

describe('entryCostMinor (minutes × rate / 60, half-up per entry)', () => {
  it.each([
    { minutes: 60, rate: 2400, cost: 2400 },
    { minutes: 25, rate: 2400, cost: 1000 },
    { minutes: 7, rate: 2200, cost: 257 }, // 256.67p
    { minutes: 1, rate: 2000, cost: 33 }, // 33.33p
    { minutes: 1, rate: 2250, cost: 38 }, // 37.5p → 38p
    { minutes: 0, rate: 2400, cost: 0 },
  ])('when $minutes min at $rate p/h, then $cost p', ({ minutes, rate, cost }) => {
    expect(entryCostMinor(minutes, rate)).toBe(cost);
  });
});

describe('labourCost', () => {
  const entries = [
    { technicianId: 'priya', startedAt: '2026-03-30T08:00:00+01:00', minutes: 240 },
    { technicianId: 'priya', startedAt: '2026-03-31T23:30:00Z', minutes: 60 }, // 00:30 BST on 1 April
    { technicianId: 'declan', startedAt: '2026-03-30T09:00:00+01:00', minutes: 7 },
    { technicianId: 'ana', startedAt: '2026-04-01T10:00:00+01:00', minutes: 30 }, // before her rate starts
    { technicianId: 'visitor', startedAt: '2026-04-01T10:00:00+01:00', minutes: 15 }, // no rates at all
  ];

  it('when entries are costed, then each uses the rate in force on its local start date', () => {
    const result = labourCost(entries, rates, LONDON);
    expect(result.entries.map((e) => [e.dayKey, e.rateMinorPerHour, e.costMinor])).toEqual([
      ['2026-03-30', 2400, 9600],
      ['2026-04-01', 2500, 2500],
      ['2026-03-30', 2200, 257],
      ['2026-04-01', null, 0],
      ['2026-04-01', null, 0],
    ]);
    expect(result).toMatchObject({ minutes: 352, unratedMinutes: 45, costMinor: 12357 });
  });

  it('when the same instant is read in UTC, then the earlier date and rate apply', () => {
    expect(labourCost([entries[1]!], rates, 'UTC').entries[0]).toMatchObject({ dayKey: '2026-03-31', costMinor: 2400 });
  });

  it('when there are no entries, then zero', () => {
    expect(labourCost([], rates, LONDON)).toEqual({ minutes: 0, unratedMinutes: 0, costMinor: 0, entries: [] });
  });
});

describe('averageRateMinorPerHour', () => {
  it.each([
    { cost: 56800, minutes: 1440, rate: 2367 }, // 2366.67
    { cost: 2400, minutes: 60, rate: 2400 },
    { cost: 0, minutes: 0, rate: null },
  ])('when $cost p over $minutes min, then $rate p/h', ({ cost, minutes, rate }) => {
    expect(averageRateMinorPerHour(cost, minutes)).toBe(rate);
  });
});

describe('partsCostMinor', () => {
  it('when parts are issued and some returned, then the net cost (scenario unit costs)', () => {
    expect(
      partsCostMinor([
        { kind: 'issue', quantityMilli: 1000, unitCostMinor: 52000 }, // hammer set, grand
        { kind: 'issue', quantityMilli: 2500, unitCostMinor: 1800 }, // 2.5 m key bushing cloth
        { kind: 'return', quantityMilli: 500, unitCostMinor: 1800 }, // 0.5 m back to stock
        { kind: 'issue', quantityMilli: 333, unitCostMinor: 3800 }, // 0.333 kg shellac: 1265.4p
      ]),
    ).toBe(56865);
  });

  it('when there are no movements, then 0', () => {
    expect(partsCostMinor([])).toBe(0);
  });

  it('when a quantity is not positive, then RangeError', () => {
    expect(() => partsCostMinor([{ kind: 'issue', quantityMilli: 0, unitCostMinor: 100 }])).toThrow(RangeError);
  });
});
