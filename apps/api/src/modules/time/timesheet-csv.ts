import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';
import { formatHoursMinutes, type TimesheetWeek } from '@keybed/shared';
import { toCsv, type CsvValue } from '../../lib/csv';

const HEADER = ['Date', 'Technician', 'Job', 'Task', 'Started', 'Ended', 'Minutes', 'Hours', 'Source', 'Needs review', 'Corrections'];

/** Local wall-clock time in the workshop's zone, "YYYY-MM-DD HH:mm". */
const local = (iso: string, timeZone: string) => format(new TZDate(Date.parse(iso), timeZone), 'yyyy-MM-dd HH:mm');

/** A week as CSV: one record per entry per local day it touches, then the week's total. */
export function timesheetCsv(week: TimesheetWeek): string {
  const rows: CsvValue[][] = [HEADER];
  for (const day of week.days) {
    for (const { entry, minutes } of day.entries) {
      rows.push([
        day.day,
        week.technician.name,
        entry.job.title,
        entry.task.title,
        local(entry.startedAt, week.timeZone),
        entry.endedAt ? local(entry.endedAt, week.timeZone) : 'running',
        minutes,
        formatHoursMinutes(minutes),
        entry.source,
        entry.needsReview ? 'yes' : 'no',
        entry.corrections.length,
      ]);
    }
  }
  rows.push(['Total', week.technician.name, null, null, null, null, week.totalMinutes, formatHoursMinutes(week.totalMinutes), null, null, null]);
  return toCsv(rows);
}

/** A file name for the download, e.g. "timesheet-priya-natarajan-2026-03-23.csv". */
export function timesheetFileName(week: TimesheetWeek): string {
  const slug = week.technician.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'technician';
  return `timesheet-${slug}-${week.weekStart}.csv`;
}
