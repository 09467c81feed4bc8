import { describe, expect, it } from 'vitest';
import { currentWeekStart, fromLocalInput, localClockTime, mondayOf, shiftWeek, toLocalInput, weekLabel, weekStartFromText } from './week';

const LONDON = 'Europe/London';

describe('weeks run Monday to Sunday in the workshop’s time zone', () => {
  it('when the day is a Sunday, then its week began six days earlier', () => {
    expect(mondayOf('2026-03-08')).toBe('2026-03-02');
    expect(mondayOf('2026-03-02')).toBe('2026-03-02');
  });

  it('when it is just after midnight on Monday in London but still Sunday in UTC (summer time), then the London week counts', () => {
    // 2026-06-08 00:30 BST is 2026-06-07 23:30 UTC.
    expect(currentWeekStart(Date.parse('2026-06-07T23:30:00Z'), LONDON)).toBe('2026-06-08');
    expect(currentWeekStart(Date.parse('2026-06-07T23:30:00Z'), 'UTC')).toBe('2026-06-01');
  });

  it('when weeks are stepped across the spring-forward change, then each step is one calendar week', () => {
    expect(shiftWeek('2026-03-23', 1)).toBe('2026-03-30');
    expect(shiftWeek('2026-03-30', -1)).toBe('2026-03-23');
  });

  it('when the URL names any day, then its Monday is used; nonsense is ignored', () => {
    expect(weekStartFromText('2026-03-04')).toBe('2026-03-02');
    expect(weekStartFromText('2026-02-30')).toBeUndefined();
    expect(weekStartFromText('last week')).toBeUndefined();
    expect(weekStartFromText(null)).toBeUndefined();
  });

  it('when a week is labelled, then it names its Monday and Sunday', () => {
    expect(weekLabel('2026-03-02')).toBe('2 Mar – 8 Mar 2026');
  });
});

describe('wall-clock times in the workshop’s zone', () => {
  it('when an entry starts at 08:15 BST, then it shows 08:15 and round-trips through a datetime-local value', () => {
    const iso = '2026-06-08T07:15:00.000Z';
    expect(localClockTime(iso, LONDON)).toBe('08:15');
    expect(toLocalInput(iso, LONDON)).toBe('2026-06-08T08:15');
    expect(fromLocalInput('2026-06-08T08:15', LONDON)).toBe(iso);
  });

  it('when a typed time is skipped by the spring-forward change (01:30 on 29 Mar 2026 in London), then it lands an hour later in summer time', () => {
    // IANA tz database, Europe/London: clocks go from 01:00 GMT to 02:00 BST on 2026-03-29.
    expect(fromLocalInput('2026-03-29T01:30', LONDON)).toBe('2026-03-29T01:30:00.000Z');
  });

  it('when the value is not a date and time, then nothing is read', () => {
    expect(fromLocalInput('', LONDON)).toBeUndefined();
    expect(fromLocalInput('08:15', LONDON)).toBeUndefined();
  });
});
