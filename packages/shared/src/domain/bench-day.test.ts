import { describe, expect, it } from 'vitest';
import { nextLocalTimeAfter } from './bench-day';

// Offsets from the IANA tz database (via @date-fns/tz): Europe/London is UTC+0 in winter and UTC+1
// from 2026-03-29 01:00 UTC; America/New_York is UTC−5 in winter, UTC−4 from 2026-03-08 07:00 UTC;
// Australia/Sydney is UTC+11 until 2026-04-05 and UTC+10 after.
describe('nextLocalTimeAfter', () => {
  it.each([
    ['a morning start closes the same evening (London, winter)', '2026-01-14T08:00:00Z', '19:00', 'Europe/London', '2026-01-14T19:00:00.000Z'],
    ['a morning start closes the same evening (London, summer time)', '2026-06-10T07:00:00Z', '19:00', 'Europe/London', '2026-06-10T18:00:00.000Z'],
    ['a start after the close runs to the next day’s close', '2026-01-14T19:30:00Z', '19:00', 'Europe/London', '2026-01-15T19:00:00.000Z'],
    ['a start exactly at the close runs to the next day’s close', '2026-01-14T19:00:00Z', '19:00', 'Europe/London', '2026-01-15T19:00:00.000Z'],
    ['the spring-forward day in London', '2026-03-29T00:30:00Z', '19:00', 'Europe/London', '2026-03-29T18:00:00.000Z'],
    ['New York, whose local evening is the next UTC day', '2026-01-14T14:00:00Z', '19:00', 'America/New_York', '2026-01-15T00:00:00.000Z'],
    ['Sydney, whose local day starts the UTC day before', '2026-01-13T22:00:00Z', '18:30', 'Australia/Sydney', '2026-01-14T07:30:00.000Z'],
  ])('%s', (_label, start, close, zone, expected) => {
    expect(nextLocalTimeAfter(start, close, zone).toISOString()).toBe(expected);
  });

  it('refuses a close time that is not HH:mm', () => {
    expect(() => nextLocalTimeAfter('2026-01-14T08:00:00Z', '7pm', 'Europe/London')).toThrow(RangeError);
  });
});
