import { isOnBoard, type CreateJobInput, type Job, type JobDetail, type JobListQuery, type MoveJobInput, type UpdateJobInput } from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { committed, notifyLive, type Changed } from '../../lib/live-events';
import type { Tx } from '../auth/auth.repo';
import { toJob } from './job-view';
import type { JobsRepo } from './jobs.repo';
import type { TechnicianLookup } from './technicians';

interface Deps {
  repo: JobsRepo;
  technicians: TechnicianLookup;
  now: () => Date;
  changed: Changed;
}

const jobNotFound = () => notFound('That job');

/** Rolls a write back because the job changed since the caller read it; answered as a 409 with the job as it is now. */
class StaleVersion extends Error {
  constructor(readonly jobId: string) {
    super('stale version');
  }
}
const stageField = (message: string) => new AppError('validation_failed', 400, message, { stageId: [message] });

export function createJobsService({ repo, technicians, now, changed }: Deps) {
  async function load(workshopId: string, id: string): Promise<Job> {
    const [row, byJob] = await Promise.all([repo.find(workshopId, id), technicians.forJobs([id])]);
    if (!row) throw jobNotFound();
    return toJob(row, byJob.get(id));
  }

  /**
   * Runs a write transaction that answers the job's id, then reads the job once committed (outside
   * the transaction, so no transaction waits on a second pooled connection). A stale version
   * rolls back and answers 409 with the job as it is now, so the client can show what changed.
   */
  async function writeJob(workshopId: string, fn: (tx: Tx) => Promise<string>): Promise<Job> {
    try {
      return await load(workshopId, await committed(changed, workshopId, repo.transaction(fn)));
    } catch (err) {
      if (!(err instanceof StaleVersion)) throw err;
      throw new AppError('version_conflict', 409, 'Someone changed this job since you loaded it. Check its current state and try again.', undefined, {
        current: await load(workshopId, err.jobId),
      });
    }
  }

  /** Unknown stage: 400 on `stageId`; another workshop's: 404. */
  async function checkStageIsOurs(tx: Tx, workshopId: string, stageId: string) {
    const owner = await repo.findStageOwner(tx, stageId);
    if (!owner) throw stageField('There is no such stage');
    if (owner !== workshopId) throw notFound('That stage');
  }

  /** Locks the job's stage, then the job; a job that moved in between has a new version. */
  async function lockJob(tx: Tx, workshopId: string, id: string, version: number, extraStageId?: string) {
    const seen = await repo.peek(tx, workshopId, id);
    if (!seen) throw jobNotFound();
    const stageIds = [...new Set([seen.stageId, extraStageId ?? seen.stageId])];
    const stages = await repo.lockStages(tx, workshopId, stageIds);
    const job = (await repo.lock(tx, workshopId, id))!;
    if (job.version !== version || job.stageId !== seen.stageId) throw new StaleVersion(id);
    return { job, stages, stageIds };
  }

  return {
    async list(workshopId: string, query: JobListQuery) {
      const rows = await repo.list(workshopId, query);
      const byJob = await technicians.forJobs(rows.map((r) => r.id));
      return rows.map((r) => toJob(r, byJob.get(r.id)));
    },

    async get(workshopId: string, id: string): Promise<JobDetail> {
      const [row, extras, history, byJob] = await Promise.all([
        repo.find(workshopId, id),
        repo.findDetailExtras(workshopId, id),
        repo.history(workshopId, id),
        technicians.forJobs([id]),
      ]);
      if (!row || !extras) throw jobNotFound();
      const job = toJob(row, byJob.get(id));
      return {
        ...job,
        client: { ...job.client, email: extras.email, phone: extras.phone },
        piano: { ...job.piano, yearApprox: extras.yearApprox, caseFinish: extras.caseFinish },
        history: history.map((e) => ({ ...e, at: e.at.toISOString() })),
      };
    },

    /** A new job for a piano of the workshop, at the end of the given stage (or of the first one). */
    create: (auth: AuthContext, input: CreateJobInput) =>
      writeJob(auth.workshopId, async (tx) => {
        const { workshopId } = auth;
        const clientId = await repo.findPianoClient(tx, workshopId, input.pianoId);
        if (!clientId) throw notFound('That piano');
        if (input.stageId) await checkStageIsOurs(tx, workshopId, input.stageId);
        const [stage] = input.stageId ? await repo.lockStages(tx, workshopId, [input.stageId]) : [await repo.lockFirstActiveStage(tx, workshopId)];
        if (!stage) throw new AppError('conflict', 409, 'The board has no active stage. Restore or add a stage first.');
        if (stage.archivedAt) throw stageField(`${stage.name} is archived; choose an active stage`);
        const at = now();
        const id = await repo.insert(tx, {
          workshopId,
          clientId,
          pianoId: input.pianoId,
          stageId: stage.id,
          position: await repo.countOnBoard(tx, stage.id),
          title: input.title,
          priority: input.priority,
          promisedOn: input.promisedOn ?? null,
          notes: input.notes ?? '',
          createdAt: at,
          updatedAt: at,
        });
        await repo.recordStageChange(tx, { workshopId, jobId: id, fromStageId: null, toStageId: stage.id, byUserId: auth.userId, at });
        await notifyLive(tx, workshopId, 'job.created', id, at);
        return id;
      }),

    /**
     * Edits carry the version they were based on. Done or cancelled takes the job off the board and
     * closes the gap in its stage; active or on hold again puts it at the end of its stage.
     */
    update: (workshopId: string, id: string, input: UpdateJobInput) =>
      writeJob(workshopId, async (tx) => {
        const { job, stages } = await lockJob(tx, workshopId, id, input.version);
        const { version: _version, ...changes } = input;
        const status = input.status ?? job.status;
        const isBlocked = input.isBlocked ?? job.isBlocked;
        const blockedReason = isBlocked ? (input.blockedReason !== undefined ? input.blockedReason : job.blockedReason) : null;
        if (isBlocked && !blockedReason?.trim()) {
          throw new AppError('validation_failed', 400, 'Say why the job is blocked', { blockedReason: ['Say why the job is blocked'] });
        }
        const wasOnBoard = isOnBoard(job.status);
        const willBeOnBoard = isOnBoard(status);
        let position = job.position;
        if (wasOnBoard && !willBeOnBoard) position = null;
        if (!wasOnBoard && willBeOnBoard) {
          const stage = stages[0]!;
          if (stage.archivedAt) throw new AppError('conflict', 409, `This job's stage, ${stage.name}, is archived. Restore the stage before reopening the job.`);
          position = await repo.countOnBoard(tx, job.stageId);
        }
        const at = now();
        await repo.bump(tx, id, { ...changes, isBlocked, blockedReason, position }, at);
        if (wasOnBoard && !willBeOnBoard) await repo.renumberStage(tx, job.stageId);
        await notifyLive(tx, workshopId, 'job.updated', id, at);
        return id;
      }),

    /**
     * Moves a job to `index` among the jobs of `stageId` (0..n, n = the stage's other jobs). Locks
     * both stages then the job, renumbers both stages without gaps, records a stage change.
     */
    move: (auth: AuthContext, id: string, input: MoveJobInput) =>
      writeJob(auth.workshopId, async (tx) => {
        const { workshopId } = auth;
        await checkStageIsOurs(tx, workshopId, input.stageId);
        const { job, stages, stageIds } = await lockJob(tx, workshopId, id, input.version, input.stageId);
        if (!isOnBoard(job.status)) {
          throw new AppError('conflict', 409, 'Only jobs on the board can be moved; reopen this job first.');
        }
        const target = stages.find((s) => s.id === input.stageId)!;
        if (target.archivedAt) throw stageField(`${target.name} is archived; choose an active stage`);
        const others = await repo.countOnBoard(tx, target.id, id);
        if (input.index > others) {
          const message = `Index must be between 0 and ${others} for ${target.name}`;
          throw new AppError('validation_failed', 400, message, { index: [message] });
        }
        if (job.stageId === target.id && job.position === input.index) return id;
        const at = now();
        await repo.makeRoom(tx, { jobId: id, stageIds, target: target.id, index: input.index });
        await repo.bump(tx, id, { stageId: target.id, position: input.index }, at);
        if (job.stageId !== target.id) {
          await repo.recordStageChange(tx, { workshopId, jobId: id, fromStageId: job.stageId, toStageId: target.id, byUserId: auth.userId, at });
        }
        await notifyLive(tx, workshopId, 'job.moved', id, at);
        return id;
      }),
  };
}

export type JobsService = ReturnType<typeof createJobsService>;
