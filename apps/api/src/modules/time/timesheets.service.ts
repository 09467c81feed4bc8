import { addDaysToDayKey, isoWeekday, splitByLocalDay, startOfLocalDay, type ApproveWeekInput, type TimesheetQuery, type TimesheetWeek, type WeekApproval } from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { visibleTechnician } from './entries.service';
import { entryViews } from './entry-view';
import type { TimeRepo } from './time.repo';

/** More entries than any real week holds; a week beyond it is refused rather than cut short. */
const MAX_WEEK_ENTRIES = 2000;

const mondayField = (weekStart: string) => {
  const message = `${weekStart} is not a Monday; weeks start on Monday`;
  return new AppError('validation_failed', 400, message, { weekStart: [message] });
};

type Ref = { id: string; title: string };

/** Adds minutes to the job → task tally, keeping first-seen order. */
function tally(byJob: Map<string, { job: Ref; minutes: number; tasks: Map<string, { task: Ref; minutes: number }> }>, job: Ref, task: Ref, minutes: number) {
  const j = byJob.get(job.id) ?? { job, minutes: 0, tasks: new Map() };
  j.minutes += minutes;
  const t = j.tasks.get(task.id) ?? { task, minutes: 0 };
  t.minutes += minutes;
  j.tasks.set(task.id, t);
  byJob.set(job.id, j);
}

export function createTimesheetsService({ repo, now }: { repo: TimeRepo; now: () => Date }) {
  async function technicianName(workshopId: string, technicianId: string) {
    const name = await repo.findMemberName(workshopId, technicianId);
    if (!name) throw notFound('That technician');
    return name;
  }

  return {
    /**
     * A technician's week, Monday to Sunday in the workshop's time zone: each day's entries with
     * the minutes that fall on that day (real elapsed minutes, so a clock change counts as it
     * happened), the total, and minutes per job and task. Running entries count up to now.
     */
    async week(auth: AuthContext, query: TimesheetQuery): Promise<TimesheetWeek> {
      const { workshopId } = auth;
      if (isoWeekday(query.weekStart) !== 1) throw mondayField(query.weekStart);
      const technicianId = visibleTechnician(auth, query.technicianId) ?? auth.userId;
      const name = await technicianName(workshopId, technicianId);
      const { timeZone } = await repo.workshopClock(workshopId);
      const from = startOfLocalDay(query.weekStart, timeZone);
      const to = startOfLocalDay(addDaysToDayKey(query.weekStart, 7), timeZone);
      const rows = await repo.entries(workshopId, { technicianId, from, to, limit: MAX_WEEK_ENTRIES + 1 });
      if (rows.length > MAX_WEEK_ENTRIES) throw new AppError('conflict', 409, 'This week has too many entries to show at once');
      const at = now();
      const entries = (await entryViews(repo, workshopId, rows, at)).reverse();
      const days = Array.from({ length: 7 }, (_, i) => ({ day: addDaysToDayKey(query.weekStart, i), minutes: 0, entries: [] as TimesheetWeek['days'][number]['entries'] }));
      const byJob = new Map<string, { job: Ref; minutes: number; tasks: Map<string, { task: Ref; minutes: number }> }>();
      for (const entry of entries) {
        const start = Math.max(Date.parse(entry.startedAt), from.getTime());
        const end = Math.min(entry.endedAt ? Date.parse(entry.endedAt) : at.getTime(), to.getTime());
        for (const part of splitByLocalDay(new Date(start), new Date(end), timeZone)) {
          const day = days.find((d) => d.day === part.dayKey);
          if (!day) continue;
          day.minutes += part.minutes;
          day.entries.push({ entry, minutes: part.minutes });
          tally(byJob, entry.job, entry.task, part.minutes);
        }
      }
      const approval = (await repo.approvedWeeks(workshopId, [technicianId])).find((w) => w.weekStart === query.weekStart);
      return {
        technician: { id: technicianId, name },
        weekStart: query.weekStart,
        timeZone,
        approval: approval ? { technicianId, weekStart: approval.weekStart, by: approval.by, at: approval.at.toISOString() } : null,
        days,
        totalMinutes: days.reduce((sum, d) => sum + d.minutes, 0),
        byJob: [...byJob.values()].map((j) => ({ job: j.job, minutes: j.minutes, tasks: [...j.tasks.values()] })),
      };
    },

    /** The foreman or owner approves a technician's week; entries in it are then locked except for the owner. */
    approve: (auth: AuthContext, input: ApproveWeekInput): Promise<WeekApproval> =>
      repo.transaction(async (tx) => {
        const { workshopId } = auth;
        if (isoWeekday(input.weekStart) !== 1) throw mondayField(input.weekStart);
        const member = await repo.lockTechnician(tx, workshopId, input.technicianId);
        if (!member) throw notFound('That technician');
        const { timeZone } = await repo.workshopClock(workshopId, tx);
        const to = startOfLocalDay(addDaysToDayKey(input.weekStart, 7), timeZone);
        if (await repo.hasRunningBefore(tx, workshopId, input.technicianId, to)) {
          throw new AppError('conflict', 409, `${member.name} is still clocked on in that week. Clock off first, then approve.`);
        }
        await repo.insertApproval(tx, { workshopId, technicianId: input.technicianId, weekStart: input.weekStart, approvedBy: auth.userId, approvedAt: now() });
        const week = (await repo.approvedWeeks(workshopId, [input.technicianId], tx)).find((w) => w.weekStart === input.weekStart)!;
        return { technicianId: input.technicianId, weekStart: week.weekStart, by: week.by, at: week.at.toISOString() };
      }),
  };
}

export type TimesheetsService = ReturnType<typeof createTimesheetsService>;
