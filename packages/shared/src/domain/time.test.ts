import { describe, expect, it } from 'vitest';
import {
  addDaysToDayKey,
  formatHoursMinutes,
  isoWeekday,
  localDayKey,
  localTimeToInstant,
  minutesBetween,
  splitByLocalDay,
  startOfLocalWeek,
} from './time';

// Clock changes: IANA tz database (via @date-fns/tz / Intl). In 2026 Europe/London springs forward
// at 01:00 GMT on 29 March and falls back at 01:00 GMT on 25 October.
const LONDON = 'Europe/London';
const iso = (date: Date) => date.toISOString();

describe('minutesBetween', () => {
  it.each([
    { start: '2026-05-11T08:00:00+01:00', end: '2026-05-11T12:30:00+01:00', minutes: 270 },
    { start: '2026-05-11T08:00:00Z', end: '2026-05-11T08:00:59Z', minutes: 0 },
    { start: '2026-05-11T08:00:00Z', end: '2026-05-11T07:58:30Z', minutes: -1 },
    { start: '2026-05-11T08:00:00+01:00', end: '2026-05-11T07:10:00Z', minutes: 10 },
  ])('when $start → $end, then $minutes', ({ start, end, minutes }) => {
    expect(minutesBetween(start, end)).toBe(minutes);
  });

  it('when given Date objects, then the same arithmetic applies', () => {
    expect(minutesBetween(new Date('2026-05-11T08:00:00Z'), new Date('2026-05-11T09:00:00Z'))).toBe(60);
  });

  it.each(['2026-05-11T08:00:00', '2026-05-11', 'yesterday', '2026-13-40T00:00:00Z'])(
    'when "%s" (no offset or invalid), then RangeError',
    (bad) => {
      expect(() => minutesBetween(bad, '2026-05-11T09:00:00Z')).toThrow(RangeError);
    },
  );
});

describe('clock changes in Europe/London (IANA tz database via @date-fns/tz / Intl)', () => {
  it('when 00:30 → 03:30 local on 2026-03-29 (spring forward), then 120 minutes', () => {
    const start = localTimeToInstant('2026-03-29', '00:30', LONDON);
    const end = localTimeToInstant('2026-03-29', '03:30', LONDON);
    expect(iso(start)).toBe('2026-03-29T00:30:00.000Z');
    expect(iso(end)).toBe('2026-03-29T02:30:00.000Z');
    expect(minutesBetween(start, end)).toBe(120);
    expect(splitByLocalDay(start, end, LONDON)).toEqual([{ dayKey: '2026-03-29', minutes: 120 }]);
  });

  it('when 00:30 → 03:30 local on 2026-10-25 (fall back), then 240 minutes', () => {
    const start = localTimeToInstant('2026-10-25', '00:30', LONDON);
    const end = localTimeToInstant('2026-10-25', '03:30', LONDON);
    expect(iso(start)).toBe('2026-10-24T23:30:00.000Z');
    expect(iso(end)).toBe('2026-10-25T03:30:00.000Z');
    expect(minutesBetween(start, end)).toBe(240);
    expect(splitByLocalDay(start, end, LONDON)).toEqual([{ dayKey: '2026-10-25', minutes: 240 }]);
  });
});

// Gap and overlap rule (old offset in a gap, first occurrence in an overlap) follows RFC 5545
// §3.3.5 (from memory).
describe('localTimeToInstant', () => {
  it.each([
    { day: '2026-05-11', time: '19:00', zone: LONDON, instant: '2026-05-11T18:00:00.000Z', why: 'bench-day close in summer (BST)' },
    { day: '2026-01-12', time: '19:00', zone: LONDON, instant: '2026-01-12T19:00:00.000Z', why: 'bench-day close in winter (GMT)' },
    { day: '2026-03-29', time: '01:30', zone: LONDON, instant: '2026-03-29T01:30:00.000Z', why: 'skipped: read at the old offset, i.e. 02:30 BST' },
    { day: '2026-03-29', time: '02:00', zone: LONDON, instant: '2026-03-29T01:00:00.000Z', why: 'first valid time after the gap' },
    { day: '2026-10-25', time: '01:30', zone: LONDON, instant: '2026-10-25T00:30:00.000Z', why: 'repeated: first occurrence (BST)' },
    { day: '2026-10-25', time: '00:59', zone: LONDON, instant: '2026-10-24T23:59:00.000Z', why: 'just before the repeat' },
    { day: '2026-10-25', time: '02:00', zone: LONDON, instant: '2026-10-25T02:00:00.000Z', why: 'after the repeat (GMT)' },
    { day: '2026-03-08', time: '02:30', zone: 'America/New_York', instant: '2026-03-08T07:30:00.000Z', why: 'US spring-forward gap → 03:30 EDT' },
    { day: '2026-05-11', time: '08:00', zone: 'UTC', instant: '2026-05-11T08:00:00.000Z', why: 'UTC' },
  ])('when $time on $day in $zone, then $instant ($why)', ({ day, time, zone, instant }) => {
    expect(iso(localTimeToInstant(day, time, zone))).toBe(instant);
  });

  it.each([
    { day: '2026-02-30', time: '08:00', zone: LONDON },
    { day: '2026-05-11', time: '24:00', zone: LONDON },
    { day: '2026-05-11', time: '8:00', zone: LONDON },
    { day: '2026-05-11', time: '08:00', zone: 'Fennick/Cross' },
  ])('when $day $time in $zone, then RangeError', ({ day, time, zone }) => {
    expect(() => localTimeToInstant(day, time, zone)).toThrow(RangeError);
  });
});

describe('local days and weeks', () => {
  it.each([
    { instant: '2026-05-11T23:30:00Z', zone: LONDON, day: '2026-05-12' },
    { instant: '2026-01-12T23:30:00Z', zone: LONDON, day: '2026-01-12' },
    { instant: '2026-10-24T23:30:00Z', zone: LONDON, day: '2026-10-25' },
    { instant: '2026-05-11T03:00:00Z', zone: 'America/New_York', day: '2026-05-10' },
  ])('when $instant in $zone, then local day $day', ({ instant, zone, day }) => {
    expect(localDayKey(instant, zone)).toBe(day);
  });

  it.each([
    { day: '2026-05-11', weekday: 1 },
    { day: '2026-05-17', weekday: 7 },
    { day: '2026-03-29', weekday: 7 },
  ])('when $day, then ISO weekday $weekday', ({ day, weekday }) => {
    expect(isoWeekday(day)).toBe(weekday);
  });

  it('when adding days, then months and years roll over', () => {
    expect(addDaysToDayKey('2026-12-31', 1)).toBe('2027-01-01');
    expect(addDaysToDayKey('2026-03-01', -1)).toBe('2026-02-28');
  });

  it.each([
    { instant: '2026-05-13T10:00:00Z', week: '2026-05-10T23:00:00.000Z', why: 'Wednesday → Monday 00:00 BST' },
    { instant: '2026-05-17T22:30:00Z', week: '2026-05-10T23:00:00.000Z', why: 'Sunday 23:30 BST is still that week' },
    { instant: '2026-05-17T23:30:00Z', week: '2026-05-17T23:00:00.000Z', why: 'Monday 00:30 BST starts the next week' },
    { instant: '2026-03-29T09:00:00Z', week: '2026-03-23T00:00:00.000Z', why: 'the spring-forward Sunday: week began in GMT' },
    { instant: '2026-03-31T09:00:00Z', week: '2026-03-29T23:00:00.000Z', why: 'the Tuesday after: week began in BST' },
  ])('when $instant, then the London week starts $week ($why)', ({ instant, week }) => {
    expect(iso(startOfLocalWeek(instant, LONDON))).toBe(week);
  });
});

describe('splitByLocalDay', () => {
  it('when an entry crosses local midnight, then minutes go to each local day', () => {
    expect(splitByLocalDay('2026-05-11T21:30:00Z', '2026-05-12T01:15:00Z', LONDON)).toEqual([
      { dayKey: '2026-05-11', minutes: 90 }, // 22:30–24:00 BST
      { dayKey: '2026-05-12', minutes: 135 }, // 00:00–02:15 BST
    ]);
  });

  it('when an entry spans several days, then every day is listed and the sum is exact', () => {
    const parts = splitByLocalDay('2026-03-28T12:00:00Z', '2026-03-30T12:00:30Z', LONDON);
    expect(parts).toEqual([
      { dayKey: '2026-03-28', minutes: 720 },
      { dayKey: '2026-03-29', minutes: 1380 }, // 23-hour day
      { dayKey: '2026-03-30', minutes: 780 },
    ]);
    expect(parts.reduce((s, p) => s + p.minutes, 0)).toBe(minutesBetween('2026-03-28T12:00:00Z', '2026-03-30T12:00:30Z'));
  });

  it('when the fall-back day is covered whole, then it has 1500 minutes', () => {
    const start = localTimeToInstant('2026-10-25', '00:00', LONDON);
    const end = localTimeToInstant('2026-10-26', '00:00', LONDON);
    expect(splitByLocalDay(start, end, LONDON)).toEqual([{ dayKey: '2026-10-25', minutes: 1500 }]);
  });

  it('when local midnight is skipped (America/Santiago, 2026-09-06), then that day starts at 01:00 (IANA tz database via Intl)', () => {
    expect(iso(localTimeToInstant('2026-09-06', '00:00', 'America/Santiago'))).toBe('2026-09-06T04:00:00.000Z');
    expect(splitByLocalDay('2026-09-05T12:00:00Z', '2026-09-06T12:00:00Z', 'America/Santiago')).toEqual([
      { dayKey: '2026-09-05', minutes: 960 },
      { dayKey: '2026-09-06', minutes: 480 },
    ]);
  });

  it('when end is not after start, then nothing', () => {
    expect(splitByLocalDay('2026-05-11T10:00:00Z', '2026-05-11T10:00:00Z', LONDON)).toEqual([]);
    expect(splitByLocalDay('2026-05-11T10:00:00Z', '2026-05-11T09:00:00Z', LONDON)).toEqual([]);
  });
});

describe('formatHoursMinutes', () => {
  it.each([
    { minutes: 0, text: '0:00' },
    { minutes: 5, text: '0:05' },
    { minutes: 125, text: '2:05' },
    { minutes: 600, text: '10:00' },
    { minutes: 2520, text: '42:00' },
    { minutes: -90, text: '-1:30' },
  ])('when $minutes, then "$text"', ({ minutes, text }) => {
    expect(formatHoursMinutes(minutes)).toBe(text);
  });

  it('when not a whole number, then RangeError', () => {
    expect(() => formatHoursMinutes(1.5)).toThrow(RangeError);
  });
});
