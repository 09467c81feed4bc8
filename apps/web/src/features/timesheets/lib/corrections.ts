import type { TimeEntryCorrection } from '@keybed/shared';
import { localDayKey } from '@keybed/shared';
import { localClockTime } from './week';

const shortDay = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', timeZone: 'UTC' });

/** "2 Mar 08:15" in the workshop's zone; "running" for an open end. */
export function localMoment(iso: string | null, timeZone: string): string {
  if (iso === null) return 'running';
  return `${shortDay.format(new Date(`${localDayKey(iso, timeZone)}T12:00:00Z`))} ${localClockTime(iso, timeZone)}`;
}

/** What one correction changed, one line per field ("Start: 2 Mar 08:00 → 2 Mar 08:15"). */
export function correctionChanges(correction: TimeEntryCorrection, timeZone: string): string[] {
  const { before, after } = correction;
  const lines: string[] = [];
  if (before.startedAt !== after.startedAt) lines.push(`Start: ${localMoment(before.startedAt, timeZone)} → ${localMoment(after.startedAt, timeZone)}`);
  if (before.endedAt !== after.endedAt) lines.push(`End: ${localMoment(before.endedAt, timeZone)} → ${localMoment(after.endedAt, timeZone)}`);
  if (before.task.id !== after.task.id) lines.push(`Task: ${before.task.title} → ${after.task.title}`);
  return lines;
}
