/**
 * Workshop-time-zone arithmetic. Instants are Date objects or ISO 8601 strings with an offset
 * ("2026-03-29T00:30:00Z", "…+01:00"); local calendar days are "YYYY-MM-DD" keys in a named IANA
 * zone. Durations are whole minutes of real elapsed time, so DST changes count as they happen.
 */
import { tzOffset } from '@date-fns/tz';

/** A point in time: a Date, or an ISO 8601 string that carries its UTC offset. */
export type Instant = Date | string;

/** Minutes worked on one local calendar day. */
export interface DayMinutes {
  dayKey: string;
  minutes: number;
}

const MS_PER_MINUTE = 60_000;
const MS_PER_DAY = 86_400_000;
const ISO_WITH_OFFSET = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/;

/** Milliseconds since the epoch. Throws RangeError for a string without an offset or an invalid date. */
export function toEpochMs(instant: Instant): number {
  if (typeof instant === 'string' && !ISO_WITH_OFFSET.test(instant)) {
    throw new RangeError(`"${instant}" is not an ISO 8601 instant with an offset`);
  }
  const ms = typeof instant === 'string' ? Date.parse(instant) : instant.getTime();
  if (Number.isNaN(ms)) throw new RangeError('Invalid instant');
  return ms;
}

function requireTimeZone(timeZone: string): void {
  new Intl.DateTimeFormat('en', { timeZone }); // throws RangeError for an unknown zone
}

function parseDayKey(dayKey: string): { y: number; m: number; d: number } {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(dayKey);
  const [y, m, d] = match ? [Number(match[1]), Number(match[2]), Number(match[3])] : [NaN, NaN, NaN];
  if (!match || new Date(Date.UTC(y, m - 1, d)).getUTCDate() !== d) throw new RangeError(`"${dayKey}" is not a YYYY-MM-DD date`);
  return { y, m, d };
}

/** Local wall-clock time of an instant, as epoch-style milliseconds. */
function localWallMs(ms: number, timeZone: string): number {
  return ms + tzOffset(timeZone, new Date(ms)) * MS_PER_MINUTE;
}

/** Whole minutes elapsed from start to end (real time), truncated towards zero; negative if end is earlier. */
export function minutesBetween(start: Instant, end: Instant): number {
  return Math.trunc((toEpochMs(end) - toEpochMs(start)) / MS_PER_MINUTE);
}

/** The local calendar day (YYYY-MM-DD) of an instant in a time zone. */
export function localDayKey(instant: Instant, timeZone: string): string {
  requireTimeZone(timeZone);
  return new Date(localWallMs(toEpochMs(instant), timeZone)).toISOString().slice(0, 10);
}

/** The day key `days` calendar days after (or before, if negative) dayKey. */
export function addDaysToDayKey(dayKey: string, days: number): string {
  const { y, m, d } = parseDayKey(dayKey);
  return new Date(Date.UTC(y, m - 1, d) + days * MS_PER_DAY).toISOString().slice(0, 10);
}

/** ISO 8601 weekday of a day key: 1 = Monday … 7 = Sunday. */
export function isoWeekday(dayKey: string): number {
  const { y, m, d } = parseDayKey(dayKey);
  return new Date(Date.UTC(y, m - 1, d)).getUTCDay() || 7;
}

/**
 * The instant of local wall-clock time `hhmm` ("HH:mm", 24-hour) on dayKey in timeZone.
 * A time skipped by a forward clock change is read with the offset in force before the change, so
 * it lands as far past the change as it was meant to be (01:30 on a London spring-forward day →
 * 02:30 BST). A time that occurs twice, when clocks go back, means its first occurrence.
 */
export function localTimeToInstant(dayKey: string, hhmm: string, timeZone: string): Date {
  requireTimeZone(timeZone);
  const { y, m, d } = parseDayKey(dayKey);
  const time = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(hhmm);
  if (!time) throw new RangeError(`"${hhmm}" is not a HH:mm time`);
  const wallMs = Date.UTC(y, m - 1, d, Number(time[1]), Number(time[2]));
  const offsetBefore = tzOffset(timeZone, new Date(wallMs - MS_PER_DAY));
  const offsetAfter = tzOffset(timeZone, new Date(wallMs + MS_PER_DAY));
  const matches = [offsetBefore, offsetAfter]
    .map((offset) => wallMs - offset * MS_PER_MINUTE)
    .filter((ms) => localWallMs(ms, timeZone) === wallMs);
  return new Date(matches.length > 0 ? Math.min(...matches) : wallMs - offsetBefore * MS_PER_MINUTE);
}

/** Local midnight at the start of the day key (the first instant of that day if midnight is skipped). */
export function startOfLocalDay(dayKey: string, timeZone: string): Date {
  return localTimeToInstant(dayKey, '00:00', timeZone);
}

/** Start of the local week (Monday 00:00, ISO 8601) containing the instant, as an instant. */
export function startOfLocalWeek(instant: Instant, timeZone: string): Date {
  const dayKey = localDayKey(instant, timeZone);
  return startOfLocalDay(addDaysToDayKey(dayKey, 1 - isoWeekday(dayKey)), timeZone);
}

/**
 * Splits start → end into whole minutes per local day, in day order. Minutes are counted from the
 * start so the parts sum exactly to {@link minutesBetween}. Returns [] when end is not after start.
 */
export function splitByLocalDay(start: Instant, end: Instant, timeZone: string): DayMinutes[] {
  const startMs = toEpochMs(start);
  const endMs = toEpochMs(end);
  const result: DayMinutes[] = [];
  let dayKey = localDayKey(new Date(startMs), timeZone);
  let countedMinutes = 0;
  while (endMs > startMs) {
    const nextDayMs = startOfLocalDay(addDaysToDayKey(dayKey, 1), timeZone).getTime();
    const untilMinutes = Math.trunc((Math.min(nextDayMs, endMs) - startMs) / MS_PER_MINUTE);
    if (untilMinutes > countedMinutes) result.push({ dayKey, minutes: untilMinutes - countedMinutes });
    countedMinutes = untilMinutes;
    if (nextDayMs >= endMs) break;
    dayKey = addDaysToDayKey(dayKey, 1);
  }
  return result;
}

/** Minutes as "h:mm" (125 → "2:05", −90 → "-1:30"). Throws RangeError unless a safe integer. */
export function formatHoursMinutes(minutes: number): string {
  if (!Number.isSafeInteger(minutes)) throw new RangeError('Minutes must be a whole number');
  const magnitude = Math.abs(minutes);
  return `${minutes < 0 ? '-' : ''}${Math.floor(magnitude / 60)}:${String(magnitude % 60).padStart(2, '0')}`;
}
