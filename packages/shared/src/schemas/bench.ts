import { z } from 'zod';
import { Role } from './auth';
import { Id } from './common';
import { DateOnly } from './jobs';

/*
 * Bench work: tasks on jobs, task templates per stage, time entries, the wall screen and
 * timesheets. A "technician" on the wire is a member of the workshop identified by their user id;
 * every duration is whole minutes and every instant an ISO 8601 string with its offset.
 */

const PersonRef = z.object({ id: z.string(), name: z.string() });
const Ref = z.object({ id: z.string(), title: z.string() });

/** An instant with an explicit offset ("2026-03-29T00:30:00Z", "2026-03-29T01:30:00+01:00"). */
export const InstantInput = z.iso.datetime({ offset: true, error: 'Use a date and time with its offset, like 2026-03-29T08:30:00Z' });

// ── Tasks ────────────────────────────────────────────────────────────────────

export const TASK_STATUSES = ['todo', 'in_progress', 'done'] as const;
export const TaskStatus = z.enum(TASK_STATUSES, { error: 'Choose to do, in progress or done' });
export type TaskStatus = z.infer<typeof TaskStatus>;

const TaskTitle = z.string({ error: 'Title is required' }).trim().min(1, { error: 'Title is required' }).max(200, { error: 'Title is too long' });
/** Estimate in whole minutes; at most 500 hours. */
export const EstimatedMinutes = z
  .number({ error: 'Estimate must be a number of minutes' })
  .int({ error: 'Estimate must be whole minutes' })
  .min(0, { error: 'Estimate cannot be negative' })
  .max(30_000, { error: 'Estimate is too large' });
const AssigneeIds = z
  .array(Id)
  .max(20, { error: 'At most 20 assignees' })
  .refine((ids) => new Set(ids).size === ids.length, { error: 'A technician is listed twice' });

export const CreateTaskInput = z.object({
  title: TaskTitle,
  stageId: Id.nullable().optional(),
  /** User ids of the technicians assigned. */
  assigneeIds: AssigneeIds.optional(),
  estimatedMinutes: EstimatedMinutes.nullable().optional(),
});
export type CreateTaskInput = z.infer<typeof CreateTaskInput>;

/** Edits carry the version they were based on; a stale one gets 409 with the task as it is now. */
export const UpdateTaskInput = z
  .object({
    version: z.number({ error: 'Version must be a number' }).int().min(1),
    title: TaskTitle.optional(),
    stageId: Id.nullable().optional(),
    assigneeIds: AssigneeIds.optional(),
    estimatedMinutes: EstimatedMinutes.nullable().optional(),
    status: TaskStatus.optional(),
    /** 0-based place among the job's tasks. */
    position: z.number({ error: 'Position must be a number' }).int({ error: 'Position must be a whole number' }).min(0, { error: 'Position cannot be negative' }).optional(),
  })
  .refine(({ version: _version, ...changes }) => Object.values(changes).some((x) => x !== undefined), { error: 'Nothing to change', path: ['title'] });
export type UpdateTaskInput = z.infer<typeof UpdateTaskInput>;

export const Task = z.object({
  id: z.string(),
  jobId: z.string(),
  stage: z.object({ id: z.string(), name: z.string() }).nullable(),
  title: z.string(),
  status: TaskStatus,
  estimatedMinutes: z.number().nullable(),
  /** Minutes recorded against the task so far (running entries counted up to now). */
  loggedMinutes: z.number(),
  position: z.number(),
  version: z.number(),
  assignees: z.array(PersonRef),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Task = z.infer<typeof Task>;

export const TaskList = z.object({ tasks: z.array(Task) });
export type TaskList = z.infer<typeof TaskList>;

/** Adds the stage's template tasks to a job; items whose title the job already has in that stage are skipped. */
export const TasksFromTemplateInput = z.object({ stageId: Id });
export type TasksFromTemplateInput = z.infer<typeof TasksFromTemplateInput>;
export const TasksFromTemplateResult = z.object({ tasks: z.array(Task), skippedTitles: z.array(z.string()) });
export type TasksFromTemplateResult = z.infer<typeof TasksFromTemplateResult>;

// ── Task templates (one per stage) ───────────────────────────────────────────

export const TaskTemplateItemInput = z.object({ title: TaskTitle, estimatedMinutes: EstimatedMinutes.nullable().optional() });
export type TaskTemplateItemInput = z.infer<typeof TaskTemplateItemInput>;

/** `PUT /api/stages/:id/task-template`: the stage's template items, in order (replaces the list). */
export const PutTaskTemplateInput = z.object({
  items: z
    .array(TaskTemplateItemInput)
    .max(50, { error: 'At most 50 tasks in a template' })
    .refine((items) => new Set(items.map((i) => i.title.toLowerCase())).size === items.length, { error: 'A task title is listed twice' }),
});
export type PutTaskTemplateInput = z.infer<typeof PutTaskTemplateInput>;

export const TaskTemplate = z.object({
  stage: z.object({ id: z.string(), name: z.string() }),
  items: z.array(z.object({ id: z.string(), title: z.string(), estimatedMinutes: z.number().nullable(), position: z.number() })),
  updatedAt: z.string().nullable(),
});
export type TaskTemplate = z.infer<typeof TaskTemplate>;

// ── Time entries ─────────────────────────────────────────────────────────────

export const TIME_ENTRY_SOURCES = ['wall', 'web', 'correction'] as const;
export const TimeEntrySource = z.enum(TIME_ENTRY_SOURCES);
export type TimeEntrySource = z.infer<typeof TimeEntrySource>;

/** A client-made key (e.g. a UUID) that makes a replayed clock action count once. */
export const IdempotencyKey = z
  .string()
  .regex(/^[A-Za-z0-9_-]{8,100}$/, { error: 'Use 8 to 100 letters, digits, - or _' });

/**
 * `at` is for actions replayed after the network dropped: the time the action really happened,
 * not in the future, at most 24 hours ago and not before the technician's last entry.
 */
export const ClockOnInput = z.object({ taskId: Id, at: InstantInput.optional(), idempotencyKey: IdempotencyKey.optional() });
export type ClockOnInput = z.infer<typeof ClockOnInput>;
export const ClockOffInput = z.object({ at: InstantInput.optional(), idempotencyKey: IdempotencyKey.optional() });
export type ClockOffInput = z.infer<typeof ClockOffInput>;

/** The longest an offline action may wait before it is replayed, in hours. */
export const MAX_REPLAY_AGE_HOURS = 24;

export const TimeEntryCorrection = z.object({
  id: z.string(),
  reason: z.string(),
  by: PersonRef.nullable(),
  at: z.string(),
  before: z.object({ startedAt: z.string(), endedAt: z.string().nullable(), task: Ref }),
  after: z.object({ startedAt: z.string(), endedAt: z.string().nullable(), task: Ref }),
});
export type TimeEntryCorrection = z.infer<typeof TimeEntryCorrection>;

export const TimeEntry = z.object({
  id: z.string(),
  technician: PersonRef,
  task: Ref,
  job: Ref,
  startedAt: z.string(),
  /** Null while running. */
  endedAt: z.string().nullable(),
  /** Real elapsed minutes (a daylight-saving change counts as it happened); running entries up to now. */
  minutes: z.number(),
  source: TimeEntrySource,
  createdBy: PersonRef.nullable(),
  needsReview: z.boolean(),
  reviewReason: z.string().nullable(),
  /** True when the entry lies in an approved week (only the owner may correct it). */
  isLocked: z.boolean(),
  /** Oldest first: the audit trail shown beside the entry. */
  corrections: z.array(TimeEntryCorrection),
});
export type TimeEntry = z.infer<typeof TimeEntry>;

/** What a clock action answers: the entry it started (clock-on) or stopped (clock-off), and any entry it stopped on the way. */
export const ClockResult = z.object({ entry: TimeEntry, stopped: TimeEntry.nullable() });
export type ClockResult = z.infer<typeof ClockResult>;

/** `from`/`to`: a local day (YYYY-MM-DD, in the workshop's time zone; `to` inclusive) or an instant. */
export const TimeEntryQuery = z.object({
  technicianId: Id.optional(),
  from: z.union([DateOnly, InstantInput]).optional(),
  to: z.union([DateOnly, InstantInput]).optional(),
  jobId: Id.optional(),
  needsReview: z.enum(['true', 'false']).transform((v) => v === 'true').optional(),
  limit: z.coerce.number().int().min(1).max(1000).default(500),
});
export type TimeEntryQuery = z.infer<typeof TimeEntryQuery>;

export const TimeEntryList = z.object({ entries: z.array(TimeEntry) });
export type TimeEntryList = z.infer<typeof TimeEntryList>;

const Reason = z.string({ error: 'Say why' }).trim().min(3, { error: 'Say why, in a few words' }).max(500, { error: 'Reason is too long' });

/** Foreman or owner corrects an entry; the reason is required and kept with the old and new values. */
export const CorrectionInput = z
  .object({
    reason: Reason,
    startedAt: InstantInput.optional(),
    /** Stops a running entry, or moves the end of a stopped one. */
    endedAt: InstantInput.optional(),
    taskId: Id.optional(),
  })
  .refine((v) => v.startedAt !== undefined || v.endedAt !== undefined || v.taskId !== undefined, { error: 'Change the start, the end or the task', path: ['startedAt'] })
  .refine((v) => !v.startedAt || !v.endedAt || Date.parse(v.endedAt) > Date.parse(v.startedAt), { error: 'The end must be after the start', path: ['endedAt'] });
export type CorrectionInput = z.infer<typeof CorrectionInput>;

/** Foreman or owner adds an entry a technician forgot to clock (source "correction"). */
export const CreateTimeEntryInput = z
  .object({ technicianId: Id, taskId: Id, startedAt: InstantInput, endedAt: InstantInput, reason: Reason })
  .refine((v) => Date.parse(v.endedAt) > Date.parse(v.startedAt), { error: 'The end must be after the start', path: ['endedAt'] });
export type CreateTimeEntryInput = z.infer<typeof CreateTimeEntryInput>;

/** Who is on what right now. */
export const RunningEntry = z.object({
  entryId: z.string(),
  technician: PersonRef,
  task: Ref,
  job: Ref,
  startedAt: z.string(),
});
export type RunningEntry = z.infer<typeof RunningEntry>;
export const RunningList = z.object({ running: z.array(RunningEntry) });
export type RunningList = z.infer<typeof RunningList>;

// ── Timesheets ───────────────────────────────────────────────────────────────

/** `weekStart` is the Monday (local date) the week starts on. `format=csv` answers text/csv. */
export const TimesheetQuery = z.object({
  technicianId: Id.optional(),
  weekStart: DateOnly,
  format: z.enum(['json', 'csv']).default('json'),
});
export type TimesheetQuery = z.infer<typeof TimesheetQuery>;

export const ApproveWeekInput = z.object({ technicianId: Id, weekStart: DateOnly });
export type ApproveWeekInput = z.infer<typeof ApproveWeekInput>;

export const WeekApproval = z.object({ technicianId: z.string(), weekStart: z.string(), by: PersonRef.nullable(), at: z.string() });
export type WeekApproval = z.infer<typeof WeekApproval>;

export const TimesheetDay = z.object({
  /** Local date, YYYY-MM-DD. */
  day: z.string(),
  minutes: z.number(),
  /** Entries touching the day, each with the minutes that fall on it. */
  entries: z.array(z.object({ entry: TimeEntry, minutes: z.number() })),
});
export const TimesheetWeek = z.object({
  technician: PersonRef,
  weekStart: z.string(),
  timeZone: z.string(),
  approval: WeekApproval.nullable(),
  /** Monday to Sunday, always seven. */
  days: z.array(TimesheetDay),
  totalMinutes: z.number(),
  byJob: z.array(z.object({ job: Ref, minutes: z.number(), tasks: z.array(z.object({ task: Ref, minutes: z.number() })) })),
});
export type TimesheetWeek = z.infer<typeof TimesheetWeek>;

// ── Technician PINs ──────────────────────────────────────────────────────────

/** Exactly six digits. */
export const Pin = z.string({ error: 'Enter the 6-digit PIN' }).regex(/^\d{6}$/, { error: 'The PIN is 6 digits' });

/** A member sets their own PIN; the account password confirms it is them. */
export const SetOwnPinInput = z.object({ pin: Pin, password: z.string({ error: 'Password is required' }).min(1, { error: 'Password is required' }).max(256) });
export type SetOwnPinInput = z.infer<typeof SetOwnPinInput>;
/** The owner sets a member's PIN. */
export const SetMemberPinInput = z.object({ pin: Pin });
export type SetMemberPinInput = z.infer<typeof SetMemberPinInput>;

/** Wrong PINs in a row before a technician is refused, and for how long. */
export const PIN_FAILURES_BEFORE_LOCK = 5;
export const PIN_LOCK_MINUTES = 5;

export const PinStatus = z.object({ hasPin: z.boolean(), lockedUntil: z.string().nullable(), failedAttempts: z.number() });
export type PinStatus = z.infer<typeof PinStatus>;

/**
 * `GET /api/technicians`: the workshop's active members for assigning tasks, picking a timesheet
 * and unlocking a PIN (`membershipId` is what `/api/team/members/:id/…` takes). Technicians first.
 */
export const BenchTechnician = z.object({
  id: z.string(),
  membershipId: z.string(),
  name: z.string(),
  role: Role,
  hasPin: z.boolean(),
  lockedUntil: z.string().nullable(),
});
export type BenchTechnician = z.infer<typeof BenchTechnician>;
export const BenchTechnicianList = z.object({ technicians: z.array(BenchTechnician) });
export type BenchTechnicianList = z.infer<typeof BenchTechnicianList>;

// ── The wall screen ──────────────────────────────────────────────────────────

export const PairWallInput = z.object({
  name: z.string({ error: 'Name the screen' }).trim().min(1, { error: 'Name the screen' }).max(80, { error: 'Name is too long' }),
});
export type PairWallInput = z.infer<typeof PairWallInput>;

export const WallDevice = z.object({
  id: z.string(),
  name: z.string(),
  pairedBy: PersonRef.nullable(),
  createdAt: z.string(),
  lastSeenAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
});
export type WallDevice = z.infer<typeof WallDevice>;
export const WallDeviceList = z.object({ devices: z.array(WallDevice) });
export type WallDeviceList = z.infer<typeof WallDeviceList>;

/** What pairing answers (the device cookie comes in Set-Cookie), and what `GET /api/wall/session` answers. */
export const WallPairing = z.object({
  device: z.object({ id: z.string(), name: z.string() }),
  workshop: z.object({ id: z.string(), name: z.string(), timeZone: z.string() }),
});
export type WallPairing = z.infer<typeof WallPairing>;

export const WallTechnician = z.object({
  id: z.string(),
  name: z.string(),
  hasPin: z.boolean(),
  /** Set while wrong PINs keep this technician out. */
  lockedUntil: z.string().nullable(),
  running: RunningEntry.nullable(),
});
export type WallTechnician = z.infer<typeof WallTechnician>;
export const WallTechnicianList = z.object({ technicians: z.array(WallTechnician) });
export type WallTechnicianList = z.infer<typeof WallTechnicianList>;

export const VerifyPinInput = z.object({ pin: Pin });
export type VerifyPinInput = z.infer<typeof VerifyPinInput>;

/** A task the wall screen offers; assigned ones come first. */
export const WallTask = z.object({
  id: z.string(),
  title: z.string(),
  status: TaskStatus,
  isAssigned: z.boolean(),
  job: z.object({ id: z.string(), title: z.string(), clientName: z.string(), pianoLabel: z.string() }),
  stage: z.object({ id: z.string(), name: z.string() }).nullable(),
});
export type WallTask = z.infer<typeof WallTask>;

/** The technician's open tasks and what they are on, as the wall shows them after a PIN check. */
export const WallTechnicianTasks = z.object({
  technician: PersonRef,
  running: RunningEntry.nullable(),
  tasks: z.array(WallTask),
});
export type WallTechnicianTasks = z.infer<typeof WallTechnicianTasks>;

/** How long a clock grant can be sent, and the span after its PIN check that it covers. */
export const WALL_GRANT_HOURS = 24;
export const WALL_GRANT_WINDOW_MINUTES = 5;

/**
 * A clock grant: what lets the screen send, later and without the PIN, the clock actions a
 * technician made in the PIN session it came from (while the network was down). It works only
 * from the screen it was given to, for that technician, for actions whose `at` lies within
 * WALL_GRANT_WINDOW_MINUTES of `issuedAt`, until `expiresAt`. A PIN change or lock ends it.
 */
export const WallClockGrant = z.object({ token: z.string(), issuedAt: z.string(), expiresAt: z.string() });
export type WallClockGrant = z.infer<typeof WallClockGrant>;

/** `POST /api/wall/technicians/:id/verify-pin` answers the technician's open tasks and a clock grant. */
export const WallPinCheck = WallTechnicianTasks.extend({ grant: WallClockGrant });
export type WallPinCheck = z.infer<typeof WallPinCheck>;

const GrantToken = z.string({ error: 'The grant is not valid' }).regex(/^[A-Za-z0-9_-]{32,128}$/, { error: 'The grant is not valid' });

/** Exactly one of `pin` and `grant`: a clear field error on both when neither or both come. */
function pinOrGrant(v: { pin?: string | undefined; grant?: string | undefined }, ctx: z.core.$RefinementCtx) {
  if (v.pin !== undefined && v.grant !== undefined) {
    ctx.addIssue({ code: 'custom', path: ['grant'], message: 'Send the PIN or a grant, not both' });
  } else if (v.pin === undefined && v.grant === undefined) {
    for (const path of ['pin', 'grant']) ctx.addIssue({ code: 'custom', path: [path], message: 'Enter the 6-digit PIN, or send the grant from the PIN check' });
  }
}

/**
 * Every wall action names the technician and carries either the PIN they just entered or, for an
 * action kept on the screen while the network was down, the grant from their PIN check.
 */
export const WallClockOnInput = ClockOnInput.extend({ technicianId: Id, pin: Pin.optional(), grant: GrantToken.optional() }).superRefine(pinOrGrant);
export type WallClockOnInput = z.infer<typeof WallClockOnInput>;
export const WallClockOffInput = ClockOffInput.extend({ technicianId: Id, pin: Pin.optional(), grant: GrantToken.optional() }).superRefine(pinOrGrant);
export type WallClockOffInput = z.infer<typeof WallClockOffInput>;
