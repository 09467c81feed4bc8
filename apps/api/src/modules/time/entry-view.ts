import { addDaysToDayKey, localDayKey, minutesBetween, startOfLocalWeek, type TimeEntry } from '@keybed/shared';
import type { Db, EntryRow, TimeRepo } from './time.repo';

/** The Monday (local date) of the week an instant falls in. */
export const weekKeyOf = (at: Date, timeZone: string) => localDayKey(startOfLocalWeek(at, timeZone), timeZone);

/** The day after a week's Sunday: `weekStart` + 7 days. */
export const nextWeekKey = (weekStart: string) => addDaysToDayKey(weekStart, 7);

export const approvalKey = (technicianId: string, weekStart: string) => `${technicianId}|${weekStart}`;

/**
 * Turns entry rows into the wire shape with their corrections and week locks: two more
 * statements for the whole list (corrections, approved weeks), never one per entry, and one for
 * the workshop's time zone unless the caller knows it.
 */
export async function entryViews(repo: TimeRepo, workshopId: string, rows: EntryRow[], now: Date, q?: Db, knownTimeZone?: string): Promise<TimeEntry[]> {
  if (rows.length === 0) return [];
  const timeZone = knownTimeZone ?? (await repo.workshopClock(workshopId, q)).timeZone;
  const corrections = await repo.corrections(rows.map((r) => r.id), q);
  const weeks = await repo.approvedWeeks(workshopId, [...new Set(rows.map((r) => r.technician.id))], q);
  const approved = new Set(weeks.map((w) => approvalKey(w.technicianId, w.weekStart)));
  const byEntry = new Map<string, TimeEntry['corrections']>();
  for (const c of corrections) {
    const list = byEntry.get(c.entryId) ?? [];
    list.push({
      id: c.id,
      reason: c.reason,
      by: c.by,
      at: c.at.toISOString(),
      before: { startedAt: c.oldStartedAt.toISOString(), endedAt: c.oldEndedAt?.toISOString() ?? null, task: c.oldTask },
      after: { startedAt: c.newStartedAt.toISOString(), endedAt: c.newEndedAt?.toISOString() ?? null, task: c.newTask },
    });
    byEntry.set(c.entryId, list);
  }
  return rows.map((r) => ({
    id: r.id,
    technician: r.technician,
    task: r.task,
    job: r.job,
    startedAt: r.startedAt.toISOString(),
    endedAt: r.endedAt?.toISOString() ?? null,
    minutes: Math.max(0, minutesBetween(r.startedAt, r.endedAt ?? now)),
    source: r.source,
    createdBy: r.createdBy,
    needsReview: r.needsReview,
    reviewReason: r.reviewReason,
    isLocked: approved.has(approvalKey(r.technician.id, weekKeyOf(r.startedAt, timeZone))),
    corrections: byEntry.get(r.id) ?? [],
  }));
}
