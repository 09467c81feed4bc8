import { MAX_REPLAY_AGE_HOURS, type ClockOffInput, type ClockOnInput, type ClockResult, type JobStatus, type RunningEntry } from '@keybed/shared';
import { AppError, notFound } from '../../http/errors';
import { committed, notifyLive, type Changed } from '../../lib/live-events';
import type { Tx } from '../auth/auth.repo';
import { entryViews } from './entry-view';
import { checkWeekOpen, translateEntryConstraint } from './time-rules';
import type { TimeRepo } from './time.repo';

/** Who is clocking, for whom, and from where. */
export interface ClockActor {
  workshopId: string;
  /** The technician's user id. */
  technicianId: string;
  /** Who performed the action (the technician at the wall, or the signed-in member). */
  byUserId: string;
  source: 'wall' | 'web';
  deviceId?: string | null;
  /**
   * Runs first in the action's transaction, once the technician's row is locked, and throws to
   * refuse: a wall screen's clock grant is checked here, so a PIN change cannot slip in between.
   */
  authorise?: ((tx: Tx) => Promise<void>) | undefined;
}

/** `isNew` is false when nothing changed: a replayed key or the task already running. */
export interface ClockOutcome {
  result: ClockResult;
  isNew: boolean;
}

/** Device clocks drift; an `at` this far ahead of the server still counts as "now". */
const FUTURE_TOLERANCE_MS = 60_000;
const MAX_REPLAY_AGE_MS = MAX_REPLAY_AGE_HOURS * 3600_000;

const JOB_STATUS_WORDS: Record<JobStatus, string> = { active: 'active', on_hold: 'on hold', done: 'done', cancelled: 'cancelled', proposed: 'waiting for the client' };

const atField = (message: string) => new AppError('validation_failed', 400, message, { at: [message] });
const keyReused = () =>
  new AppError('conflict', 409, 'This idempotency key was already used for a different clock action', { idempotencyKey: ['Already used for a different action'] });

/** The moment the action happened: now, or the replayed `at` if it is within bounds. */
function actionTime(at: string | undefined, now: Date): Date {
  if (!at) return now;
  const ms = Date.parse(at);
  if (ms > now.getTime() + FUTURE_TOLERANCE_MS) throw atField('The time of a clock action cannot be in the future');
  if (ms < now.getTime() - MAX_REPLAY_AGE_MS) {
    throw atField(`Clock actions older than ${MAX_REPLAY_AGE_HOURS} hours cannot be replayed; ask the foreman to correct the timesheet`);
  }
  return new Date(Math.min(ms, now.getTime()));
}

/**
 * Refuses a start before the technician's latest recorded moment (the end of their last entry,
 * or the start of the running one: a clock-on must come strictly after that start).
 */
function checkAfter(name: string, latest: { startedAt: Date; endedAt: Date | null } | undefined, at: Date) {
  if (!latest) return;
  const edge = latest.endedAt ?? latest.startedAt;
  const isRunning = latest.endedAt === null;
  if (at.getTime() < edge.getTime() || (isRunning && at.getTime() === edge.getTime())) {
    throw new AppError('conflict', 409, `That time is not after ${name}'s last time entry (${edge.toISOString()}). Replay actions in order, or ask the foreman to correct the timesheet.`);
  }
}

interface Deps {
  repo: TimeRepo;
  now: () => Date;
  /** Told after each committed clock action: the board's cards show the minutes logged. */
  changed?: Changed;
}

export function createClockService({ repo, now, changed = () => {} }: Deps) {
  async function result(tx: Tx, workshopId: string, timeZone: string, entryId: string, stoppedId: string | null, at: Date): Promise<ClockResult> {
    const rows = await repo.entriesByIds(workshopId, stoppedId ? [entryId, stoppedId] : [entryId], tx);
    const views = await entryViews(repo, workshopId, rows, at, tx, timeZone);
    return { entry: views.find((v) => v.id === entryId)!, stopped: views.find((v) => v.id === stoppedId) ?? null };
  }

  async function lockActiveTechnician(tx: Tx, actor: ClockActor) {
    const member = await repo.lockTechnician(tx, actor.workshopId, actor.technicianId);
    if (actor.authorise) await actor.authorise(tx);
    if (!member?.isActive) throw notFound('That technician');
    return member;
  }

  return {
    /**
     * Starts an entry on the task. A running entry of the technician is stopped at the same moment,
     * in the same transaction. Every action of one technician holds their membership lock.
     */
    async clockOn(actor: ClockActor, input: ClockOnInput): Promise<ClockOutcome> {
      const { workshopId, technicianId } = actor;
      const write = repo
        .transaction(async (tx): Promise<ClockOutcome> => {
          const member = await lockActiveTechnician(tx, actor);
          const { timeZone } = member;
          const nowAt = now();
          if (input.idempotencyKey) {
            const prior = await repo.findByKey(tx, workshopId, input.idempotencyKey, 'start');
            if (prior) {
              if (prior.technicianId !== technicianId || prior.taskId !== input.taskId) throw keyReused();
              const stoppedId = await repo.findEndedAt(tx, workshopId, technicianId, prior.startedAt);
              return { result: await result(tx, workshopId, timeZone, prior.id, stoppedId ?? null, nowAt), isNew: false };
            }
          }
          const at = actionTime(input.at, nowAt);
          const task = await repo.lockTask(tx, workshopId, input.taskId);
          if (!task) throw notFound('That task');
          if (task.status === 'done') throw new AppError('task_not_open', 409, `“${task.title}” is done. Choose an open task.`);
          if (task.jobStatus !== 'active') {
            throw new AppError('task_not_open', 409, `The job “${task.jobTitle}” is ${JOB_STATUS_WORDS[task.jobStatus]}. Choose a task of an active job.`);
          }
          const latest = await repo.latestEntry(tx, workshopId, technicianId);
          const running = latest && latest.endedAt === null ? latest : undefined;
          if (running?.taskId === task.id) return { result: await result(tx, workshopId, timeZone, running.id, null, nowAt), isNew: false };
          checkAfter(member.name, latest, at);
          await checkWeekOpen(repo, tx, workshopId, technicianId, [at], timeZone);
          if (running) await repo.stop(tx, running.id, at, null);
          const id = await repo.insert(tx, {
            workshopId,
            technicianId,
            taskId: task.id,
            jobId: task.jobId,
            startedAt: at,
            source: actor.source,
            createdBy: actor.byUserId,
            deviceId: actor.deviceId ?? null,
            idempotencyKey: input.idempotencyKey ?? null,
            createdAt: nowAt,
            updatedAt: nowAt,
          });
          await repo.startTaskIfTodo(tx, task.id, nowAt);
          await notifyLive(tx, workshopId, 'task.changed', task.jobId, nowAt);
          if (running && running.jobId !== task.jobId) await notifyLive(tx, workshopId, 'task.changed', running.jobId, nowAt);
          await notifyLive(tx, workshopId, 'time.changed', technicianId, nowAt);
          return { result: await result(tx, workshopId, timeZone, id, running?.id ?? null, nowAt), isNew: true };
        })
        .catch(translateEntryConstraint);
      return committed(changed, workshopId, write);
    },

    /** Stops the technician's running entry; with nothing running, 409 and nothing changes. */
    async clockOff(actor: ClockActor, input: ClockOffInput): Promise<ClockOutcome> {
      const { workshopId, technicianId } = actor;
      const write = repo
        .transaction(async (tx): Promise<ClockOutcome> => {
          const member = await lockActiveTechnician(tx, actor);
          const { timeZone } = member;
          const nowAt = now();
          if (input.idempotencyKey) {
            const prior = await repo.findByKey(tx, workshopId, input.idempotencyKey, 'stop');
            if (prior) {
              if (prior.technicianId !== technicianId) throw keyReused();
              return { result: await result(tx, workshopId, timeZone, prior.id, null, nowAt), isNew: false };
            }
          }
          const at = actionTime(input.at, nowAt);
          const running = await repo.findRunning(tx, workshopId, technicianId);
          if (!running) throw new AppError('not_running', 409, `${member.name} is not clocked on to anything.`);
          if (at.getTime() <= running.startedAt.getTime()) {
            throw new AppError('conflict', 409, `That time is not after the start of ${member.name}'s running entry (${running.startedAt.toISOString()}).`);
          }
          await checkWeekOpen(repo, tx, workshopId, technicianId, [at], timeZone);
          await repo.stop(tx, running.id, at, input.idempotencyKey ?? null);
          await notifyLive(tx, workshopId, 'time.changed', technicianId, nowAt);
          await notifyLive(tx, workshopId, 'task.changed', running.jobId, nowAt);
          return { result: await result(tx, workshopId, timeZone, running.id, null, nowAt), isNew: true };
        })
        .catch(translateEntryConstraint);
      return committed(changed, workshopId, write);
    },

    /** Who is on what right now, longest-running first. */
    async running(workshopId: string): Promise<RunningEntry[]> {
      const rows = await repo.running(workshopId);
      return rows.map((r) => ({ entryId: r.id, technician: r.technician, task: r.task, job: r.job, startedAt: r.startedAt.toISOString() }));
    },
  };
}

export type ClockService = ReturnType<typeof createClockService>;
