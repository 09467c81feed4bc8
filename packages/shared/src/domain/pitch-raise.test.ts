import { describe, expect, it } from 'vitest';
import { frequencyFromCents } from './pitch';
import { pitchRaisePlan } from './pitch-raise';

const flatBy = (cents: number) => frequencyFromCents(440, -cents);

describe('pitchRaisePlan', () => {
  // Threshold 10 cents flat: common practice. One pass up to ~20 cents, several beyond: [S4b].
  // Overpull above ~5 cents [S4a]; 30 % of the raise because the treble falls back ~25–35 % [S4c]
  // (trade practice, not a standard). Rough passes of up to 100 cents: common practice.
  it.each([
    { label: 'at pitch', measured: 440, needed: false, passes: 1, overpull: 0 },
    { label: '4 cents flat', measured: flatBy(4), needed: false, passes: 1, overpull: 0 },
    { label: '8 cents flat', measured: flatBy(8), needed: false, passes: 1, overpull: 2.4 },
    { label: '10 cents flat', measured: flatBy(10), needed: true, passes: 1, overpull: 3 },
    { label: 'A = 435', measured: 435, needed: true, passes: 1, overpull: 5.9 },
    { label: '20 cents flat', measured: flatBy(20), needed: true, passes: 1, overpull: 6 },
    { label: '35 cents flat', measured: flatBy(35), needed: true, passes: 2, overpull: 10.5 },
    { label: '100 cents flat', measured: flatBy(100), needed: true, passes: 2, overpull: 30 },
    { label: '150 cents flat', measured: flatBy(150), needed: true, passes: 3, overpull: 45 },
    { label: '6 cents sharp', measured: frequencyFromCents(440, 6), needed: false, passes: 1, overpull: 0 },
  ])('when $label, then raise needed $needed, $passes pass(es), overpull $overpull cents', (row) => {
    const plan = pitchRaisePlan(row.measured);
    expect(plan.isPitchRaiseNeeded).toBe(row.needed);
    expect(plan.passes).toBe(row.passes);
    expect(plan.overpullCents).toBe(row.overpull);
  });

  it('when A = 435, then −19.8 cents and about 2.3 % more load to reach 440 (derived from [S3], [S6])', () => {
    const plan = pitchRaisePlan(435);
    expect(plan.centsOff).toBeCloseTo(-19.8, 1);
    expect(plan.raiseCents).toBeCloseTo(19.8, 1);
    expect(plan.tensionRatio).toBeCloseTo(0.9774, 4);
    expect(plan.loadChangePercent).toBeCloseTo(2.31, 2);
  });

  it('when 100 cents flat, then tension 0.891 and ~12 % more load (TRADE.md §1, derived)', () => {
    const plan = pitchRaisePlan(flatBy(100));
    expect(plan.tensionRatio).toBeCloseTo(0.891, 3);
    expect(plan.loadChangePercent).toBeCloseTo(12.2, 1);
  });

  it('when sharp, then no raise and a load reduction', () => {
    const plan = pitchRaisePlan(frequencyFromCents(440, 6));
    expect(plan.centsOff).toBe(6);
    expect(plan.raiseCents).toBe(0);
    expect(plan.loadChangePercent).toBeLessThan(0);
  });

  it('when the workshop sets its own target, threshold and pass size, then they apply', () => {
    expect(pitchRaisePlan(440, 442, 5).isPitchRaiseNeeded).toBe(true); // 7.9 cents flat of 442
    expect(pitchRaisePlan(flatBy(12), 440, 15).isPitchRaiseNeeded).toBe(false);
    expect(pitchRaisePlan(flatBy(100), 440, 10, 50).passes).toBe(3);
  });

  it('when a frequency is zero or negative, then RangeError', () => {
    expect(() => pitchRaisePlan(0)).toThrow(RangeError);
    expect(() => pitchRaisePlan(440, -1)).toThrow(RangeError);
  });
});
