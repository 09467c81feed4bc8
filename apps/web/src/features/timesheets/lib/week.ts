import { addDaysToDayKey, isoWeekday, localDayKey, localTimeToInstant } from '@keybed/shared';

const DAY_KEY = /^\d{4}-\d{2}-\d{2}$/;

/** The Monday (YYYY-MM-DD) of the week holding `dayKey`; weeks run Monday to Sunday. */
export function mondayOf(dayKey: string): string {
  return addDaysToDayKey(dayKey, 1 - isoWeekday(dayKey));
}

/** The Monday of the week holding `nowMs`, in the workshop's time zone. */
export function currentWeekStart(nowMs: number, timeZone: string): string {
  return mondayOf(localDayKey(new Date(nowMs), timeZone));
}

/** A week start read from the URL: a real date, moved to its Monday; undefined if unreadable. */
export function weekStartFromText(text: string | null): string | undefined {
  if (!text || !DAY_KEY.test(text)) return undefined;
  try {
    return mondayOf(text);
  } catch {
    return undefined;
  }
}

export const shiftWeek = (weekStart: string, weeks: number) => addDaysToDayKey(weekStart, 7 * weeks);

const utcDay = (dayKey: string) => new Date(`${dayKey}T12:00:00Z`);
const dayMonth = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', timeZone: 'UTC' });
const dayMonthYear = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const weekdayDayMonth = new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', timeZone: 'UTC' });

/** "2 Mar – 8 Mar 2026" for the week starting on the Monday given. */
export function weekLabel(weekStart: string): string {
  return `${dayMonth.format(utcDay(weekStart))} – ${dayMonthYear.format(utcDay(addDaysToDayKey(weekStart, 6)))}`;
}

/** "Monday 2 March" for a local day. */
export const dayLabel = (dayKey: string) => weekdayDayMonth.format(utcDay(dayKey));

/** "08:15": an instant's wall-clock time in the workshop's zone. */
export function localClockTime(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone }).format(new Date(iso));
}

/** An instant as a `datetime-local` value ("2026-03-02T08:15") in the workshop's zone. */
export function toLocalInput(iso: string, timeZone: string): string {
  return `${localDayKey(iso, timeZone)}T${localClockTime(iso, timeZone)}`;
}

/**
 * A `datetime-local` value read as wall-clock time in the workshop's zone, as an ISO instant; a
 * time skipped by a clock change lands as `localTimeToInstant` says. Undefined when unreadable.
 */
export function fromLocalInput(value: string, timeZone: string): string | undefined {
  const match = /^(\d{4}-\d{2}-\d{2})T(\d{2}:\d{2})/.exec(value);
  if (!match) return undefined;
  try {
    return localTimeToInstant(match[1]!, match[2]!, timeZone).toISOString();
  } catch {
    return undefined;
  }
}
