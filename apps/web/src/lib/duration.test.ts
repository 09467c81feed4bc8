import { describe, expect, it } from 'vitest';
import { elapsedHoursMinutes, spokenHoursMinutes } from './duration';

describe('elapsedHoursMinutes', () => {
  it('when 3 h 20 min have passed, then it reads 3:20; seconds are dropped', () => {
    expect(elapsedHoursMinutes('2026-03-02T08:00:00Z', Date.parse('2026-03-02T11:20:59Z'))).toBe('3:20');
  });

  it('when the device clock is behind the start, then it reads 0:00 rather than a negative time', () => {
    expect(elapsedHoursMinutes('2026-03-02T08:00:00Z', Date.parse('2026-03-02T07:59:00Z'))).toBe('0:00');
  });
});

describe('spokenHoursMinutes', () => {
  it.each([
    [1, '1 minute'],
    [45, '45 minutes'],
    [60, '1 hour'],
    [200, '3 hours 20 minutes'],
  ])('when %s minutes, then "%s"', (minutes, spoken) => {
    expect(spokenHoursMinutes(minutes)).toBe(spoken);
  });
});
