import { addDaysToDayKey, startOfLocalDay, type CorrectionInput, type TimeEntry, type TimeEntryQuery } from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { committed, notifyLive, type Changed } from '../../lib/live-events';
import { entryViews } from './entry-view';
import { checkWeekOpen, translateEntryConstraint } from './time-rules';
import type { TimeRepo } from './time.repo';

const FUTURE_TOLERANCE_MS = 60_000;
const isDay = (v: string) => /^\d{4}-\d{2}-\d{2}$/.test(v);
const field = (name: string, message: string) => new AppError('validation_failed', 400, message, { [name]: [message] });

/** Technicians see only their own entries; the foreman and owner see everyone's. */
export function visibleTechnician(auth: AuthContext, technicianId: string | undefined) {
  if (auth.role !== 'technician') return technicianId;
  if (technicianId && technicianId !== auth.userId) throw new AppError('forbidden', 403, 'Technicians see only their own time entries');
  return auth.userId;
}

interface Deps {
  repo: TimeRepo;
  now: () => Date;
  /** Told after each committed correction: the board's cards show the minutes logged. */
  changed?: Changed;
}

export function createEntriesService({ repo, now, changed = () => {} }: Deps) {
  return {
    /** Entries overlapping [from, to); a day bound means the local day in the workshop's time zone (`to` inclusive). */
    async list(auth: AuthContext, query: TimeEntryQuery): Promise<TimeEntry[]> {
      const { workshopId } = auth;
      const technicianId = visibleTechnician(auth, query.technicianId);
      const { timeZone } = await repo.workshopClock(workshopId);
      const from = query.from ? (isDay(query.from) ? startOfLocalDay(query.from, timeZone) : new Date(query.from)) : undefined;
      const to = query.to ? (isDay(query.to) ? startOfLocalDay(addDaysToDayKey(query.to, 1), timeZone) : new Date(query.to)) : undefined;
      if (from && to && to.getTime() <= from.getTime()) throw field('to', 'The end of the range must be after its start');
      const rows = await repo.entries(workshopId, { technicianId, jobId: query.jobId, needsReview: query.needsReview, from, to, limit: query.limit });
      return entryViews(repo, workshopId, rows, now());
    },

    /**
     * The foreman or owner corrects an entry's start, end or task with a reason. The old and new
     * values, who and when are kept. Entries in an approved week: only the owner. The database
     * refuses an overlap with another entry of the technician.
     */
    correct: (auth: AuthContext, id: string, input: CorrectionInput) =>
      committed(
        changed,
        auth.workshopId,
        repo
          .transaction(async (tx) => {
            const { workshopId } = auth;
            const technicianId = await repo.peekEntryTechnician(tx, workshopId, id);
            if (!technicianId) throw notFound('That time entry');
            const { timeZone } = (await repo.lockTechnician(tx, workshopId, technicianId))!;
            const old = (await repo.lockEntry(tx, workshopId, id))!;
            const at = now();
            const startedAt = input.startedAt ? new Date(input.startedAt) : old.startedAt;
            const endedAt = input.endedAt ? new Date(input.endedAt) : old.endedAt;
            const task = input.taskId ? await repo.findTask(tx, workshopId, input.taskId) : { id: old.taskId, jobId: undefined };
            if (!task) throw notFound('That task');
            if (endedAt && endedAt.getTime() <= startedAt.getTime()) throw field('endedAt', 'The end must be after the start');
            const latest = at.getTime() + FUTURE_TOLERANCE_MS;
            if (startedAt.getTime() > latest) throw field('startedAt', 'The start cannot be in the future');
            if (endedAt && endedAt.getTime() > latest) throw field('endedAt', 'The end cannot be in the future');
            const isSame = startedAt.getTime() === old.startedAt.getTime() && endedAt?.getTime() === old.endedAt?.getTime() && task.id === old.taskId;
            if (isSame) throw field('startedAt', 'Nothing would change');
            const touched = [old.startedAt, startedAt, ...(old.endedAt ? [old.endedAt] : []), ...(endedAt ? [endedAt] : [])];
            await checkWeekOpen(repo, tx, workshopId, technicianId, touched, timeZone, auth.role);
            await repo.update(tx, id, {
              startedAt,
              endedAt,
              taskId: task.id,
              ...(task.jobId ? { jobId: task.jobId } : {}),
              needsReview: false,
              reviewReason: null,
              updatedAt: at,
            });
            await repo.insertCorrection(tx, {
              workshopId,
              entryId: id,
              reason: input.reason,
              byUserId: auth.userId,
              oldStartedAt: old.startedAt,
              oldEndedAt: old.endedAt,
              oldTaskId: old.taskId,
              newStartedAt: startedAt,
              newEndedAt: endedAt,
              newTaskId: task.id,
            });
            await notifyLive(tx, workshopId, 'time.changed', technicianId, at);
            const rows = await repo.entriesByIds(workshopId, [id], tx);
            return (await entryViews(repo, workshopId, rows, at, tx, timeZone))[0]!;
          })
          .catch(translateEntryConstraint),
      ),
  };
}

export type EntriesService = ReturnType<typeof createEntriesService>;
