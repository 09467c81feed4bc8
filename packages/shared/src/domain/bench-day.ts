import { addDaysToDayKey, localDayKey, localTimeToInstant, type Instant, toEpochMs } from './time';

/**
 * The first moment strictly after `instant` at which the local wall clock in `timeZone` reads
 * `hhmm` ("HH:mm", 24-hour): the bench-day close that ends an entry started at `instant`.
 * A close time skipped by a forward clock change lands as {@link localTimeToInstant} says.
 */
export function nextLocalTimeAfter(instant: Instant, hhmm: string, timeZone: string): Date {
  const ms = toEpochMs(instant);
  let dayKey = localDayKey(new Date(ms), timeZone);
  for (let i = 0; i < 3; i++) {
    const at = localTimeToInstant(dayKey, hhmm, timeZone);
    if (at.getTime() > ms) return at;
    dayKey = addDaysToDayKey(dayKey, 1);
  }
  throw new RangeError('No such local time within two days');
}
