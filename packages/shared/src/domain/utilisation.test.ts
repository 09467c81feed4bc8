import { describe, expect, it } from 'vitest';
import { utilisationRatio, workingMinutesInPeriod } from './utilisation';

// The scenario's working day: 08:00–17:30, Monday to Friday (570 minutes a day).
const WEEKDAYS = [1, 2, 3, 4, 5];

describe('workingMinutesInPeriod', () => {
  it.each([
    { from: '2026-03-02', to: '2026-03-06', minutes: 5 * 570, why: 'Monday to Friday' },
    { from: '2026-03-02', to: '2026-03-08', minutes: 5 * 570, why: 'the weekend adds nothing' },
    { from: '2026-03-07', to: '2026-03-08', minutes: 0, why: 'a weekend alone' },
    { from: '2026-03-27', to: '2026-03-30', minutes: 2 * 570, why: 'across the London spring-forward night' },
    { from: '2026-01-01', to: '2026-12-31', minutes: 261 * 570, why: '261 weekdays in 2026' },
    { from: '2026-03-06', to: '2026-03-02', minutes: 0, why: 'an empty period' },
  ])('when $from to $to, then $minutes ($why)', ({ from, to, minutes }) => {
    expect(workingMinutesInPeriod(from, to, WEEKDAYS, '08:00', '17:30')).toBe(minutes);
  });

  it('when Saturday mornings are worked too, then they count their own hours', () => {
    expect(workingMinutesInPeriod('2026-03-02', '2026-03-08', [1, 2, 3, 4, 5, 6], '08:00', '17:30')).toBe(6 * 570);
  });

  it('when the day ends before it starts, then RangeError', () => {
    expect(() => workingMinutesInPeriod('2026-03-02', '2026-03-06', WEEKDAYS, '17:30', '08:00')).toThrow(RangeError);
  });
});

describe('utilisationRatio', () => {
  it.each([
    { worked: 2280, available: 2850, ratio: 0.8 },
    { worked: 0, available: 570, ratio: 0 },
    { worked: 60, available: 0, ratio: null },
  ])('when $worked of $available, then $ratio', ({ worked, available, ratio }) => {
    expect(utilisationRatio(worked, available)).toBe(ratio);
  });
});
