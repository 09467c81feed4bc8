import { z } from 'zod';
import { Id } from './common';
import { JobStatus, SettableJobStatus } from './job-status';
import { KeytopMaterial, PianoType } from './pianos';

export { JOB_STATUSES, JobStatus, ON_BOARD_STATUSES, SettableJobStatus, isOnBoard } from './job-status';

export const JOB_PRIORITIES = ['low', 'normal', 'high', 'urgent'] as const;
export const JobPriority = z.enum(JOB_PRIORITIES, { error: 'Choose low, normal, high or urgent' });
export type JobPriority = z.infer<typeof JobPriority>;

/** A calendar date, YYYY-MM-DD. */
export const DateOnly = z.iso.date({ error: 'Use a date like 2026-12-24' });

const Title = z.string({ error: 'Title is required' }).trim().min(1, { error: 'Title is required' }).max(200, { error: 'Title is too long' });
const BlockedReason = z.string().trim().max(300, { error: 'Reason is too long' });

export const CreateJobInput = z.object({
    pianoId: Id,
    title: Title,
    stageId: Id.optional(),
    priority: JobPriority.optional(),
    promisedOn: DateOnly.nullable().optional(),
    notes: z.string().max(10000).optional(),
});
export type CreateJobInput = z.infer<typeof CreateJobInput>;

/** Edits carry the version they were based on; a stale one gets 409 with the job as it is now. */
export const UpdateJobInput = z
  .object({
    version: z.number({ error: 'Version must be a number' }).int().min(1),
    title: Title.optional(),
    status: SettableJobStatus.optional(),
    priority: JobPriority.optional(),
    promisedOn: DateOnly.nullable().optional(),
    isBlocked: z.boolean().optional(),
    blockedReason: BlockedReason.nullable().optional(),
    notes: z.string().max(10000).optional(),
  })
  .refine((v) => !(v.isBlocked === true && !v.blockedReason), { error: 'Say why the job is blocked', path: ['blockedReason'] })
  .refine(({ version: _version, ...changes }) => Object.values(changes).some((x) => x !== undefined), {
    error: 'Nothing to change',
    path: ['title'],
  });
export type UpdateJobInput = z.infer<typeof UpdateJobInput>;

/** Move to `stageId` at 0-based `index` among that stage's jobs. */
export const MoveJobInput = z.object({
  stageId: Id,
  index: z.number({ error: 'Index must be a number' }).int({ error: 'Index must be a whole number' }).min(0, { error: 'Index cannot be negative' }),
  version: z.number({ error: 'Version must be a number' }).int().min(1),
});
export type MoveJobInput = z.infer<typeof MoveJobInput>;

export const JobListQuery = z.object({
  status: JobStatus.optional(),
  pianoId: Id.optional(),
  clientId: Id.optional(),
  q: z.string().trim().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(100),
});
export type JobListQuery = z.infer<typeof JobListQuery>;

export const JobPianoSummary = z.object({
  id: z.string(),
  maker: z.string(),
  model: z.string(),
  type: PianoType,
  sizeMm: z.number().nullable(),
  serialNumber: z.string(),
  keytopMaterial: KeytopMaterial,
});

/** A job as the board card and the job page show it. */
export const Job = z.object({
  id: z.string(),
  title: z.string(),
  status: JobStatus,
  priority: JobPriority,
  stageId: z.string(),
  position: z.number().nullable(),
  promisedOn: z.string().nullable(),
  isBlocked: z.boolean(),
  blockedReason: z.string().nullable(),
  notes: z.string(),
  version: z.number(),
  client: z.object({ id: z.string(), name: z.string() }),
  piano: JobPianoSummary,
  /** Technicians with open tasks on the job (filled once tasks exist). */
  technicians: z.array(z.object({ id: z.string(), name: z.string() })),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Job = z.infer<typeof Job>;

export const JobList = z.object({ jobs: z.array(Job) });
export type JobList = z.infer<typeof JobList>;

/** What a successful move answers: the job with its new stage, position and version. */
export const MoveJobResult = z.object({ job: Job });
export type MoveJobResult = z.infer<typeof MoveJobResult>;

export const JobStageEvent = z.object({
  id: z.string(),
  fromStage: z.object({ id: z.string(), name: z.string() }).nullable(),
  toStage: z.object({ id: z.string(), name: z.string() }),
  by: z.object({ id: z.string(), name: z.string() }).nullable(),
  at: z.string(),
});
export type JobStageEvent = z.infer<typeof JobStageEvent>;

export const JobDetail = Job.extend({
  history: z.array(JobStageEvent),
  client: z.object({ id: z.string(), name: z.string(), email: z.string().nullable(), phone: z.string().nullable() }),
  piano: JobPianoSummary.extend({ yearApprox: z.number().nullable(), caseFinish: z.string() }),
});
export type JobDetail = z.infer<typeof JobDetail>;

/** Board filters, as they appear in the board's URL. */
export const BoardQuery = z.object({
  q: z.string().trim().max(200).optional(),
  blocked: z.enum(['true', 'false']).transform((v) => v === 'true').optional(),
  technicianId: Id.optional(),
});
export type BoardQuery = z.infer<typeof BoardQuery>;

/**
 * A card's hours, for every role (hours are not money): the sum of the job's task estimates, and
 * the whole minutes of each of its time entries added up, running entries counted up to the
 * moment the board was built (the same figures as the job's costing).
 */
export const BoardJobHours = z.object({ estimatedMinutes: z.number(), loggedMinutes: z.number() });
export type BoardJobHours = z.infer<typeof BoardJobHours>;

/** A job as its board card shows it. */
export const BoardJob = Job.extend({ hours: BoardJobHours });
export type BoardJob = z.infer<typeof BoardJob>;

export const BoardStage = z.object({
  id: z.string(),
  name: z.string(),
  position: z.number(),
  wipLimit: z.number().nullable(),
  /** Jobs in the stage regardless of filters (for the WIP limit). */
  jobCount: z.number(),
  jobs: z.array(BoardJob),
});
export const Board = z.object({ stages: z.array(BoardStage) });
export type Board = z.infer<typeof Board>;

/** What the live event stream carries: ids and kinds, never another workshop's data. */
export const LIVE_EVENT_KINDS = [
  'job.created',
  'job.updated',
  'job.moved',
  'stage.changed',
  /** The order of the active stages changed; `id` is the workshop's id. */
  'stages.reordered',
  'client.changed',
  'piano.changed',
  /** Who is on what changed; `id` is the technician's user id. */
  'time.changed',
  /** A job's tasks changed; `id` is the job's id. */
  'task.changed',
  /** A job's estimates changed; `id` is the job's id. */
  'estimate.changed',
  /** A part's catalogue entry or stock changed; `id` is the part's id. */
  'part.changed',
  /** A job's costs or money received changed (parts used, a sublet bill, a payment); `id` is the job's id. */
  'costing.changed',
  /** Workshop settings or cost rates changed; `id` is the workshop's id. */
  'settings.changed',
] as const;
export type LiveEventKind = (typeof LIVE_EVENT_KINDS)[number];
export const LiveEvent = z.object({ kind: z.enum(LIVE_EVENT_KINDS), id: z.string(), at: z.string() });
export type LiveEvent = z.infer<typeof LiveEvent>;
