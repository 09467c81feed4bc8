import { sql } from 'drizzle-orm';
import { boolean, check, date, foreignKey, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { jobs, stages } from './board';
import { createdAt, id, instant } from './columns';
import { memberships, users } from './users';
import { workshops } from './workshops';

/*
 * Bench work. Every row carries its workshop and every reference is a composite key with it, so a
 * task, an entry or a device can never point into another workshop. A technician is a member,
 * referenced by (workshop_id, user_id). The custom migration adds what Drizzle cannot express:
 * the btree_gist exclusion constraint against overlapping entries and deferred task positions.
 */

const workshopId = () =>
  uuid()
    .notNull()
    .references(() => workshops.id, { onDelete: 'cascade' });

export const taskStatusEnum = pgEnum('task_status', ['todo', 'in_progress', 'done']);

/** A piece of bench work on a job. Positions are 0..n-1 per job (unique, deferred, in the custom migration). */
export const tasks = pgTable(
  'tasks',
  {
    id: id(),
    workshopId: workshopId(),
    jobId: uuid().notNull(),
    stageId: uuid(),
    title: text().notNull(),
    status: taskStatusEnum().notNull().default('todo'),
    estimatedMinutes: integer(),
    position: integer().notNull(),
    version: integer().notNull().default(1),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('tasks_id_workshop').on(t.id, t.workshopId),
    unique('tasks_id_job_workshop').on(t.id, t.jobId, t.workshopId),
    foreignKey({ name: 'tasks_job_same_workshop', columns: [t.jobId, t.workshopId], foreignColumns: [jobs.id, jobs.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'tasks_stage_same_workshop', columns: [t.stageId, t.workshopId], foreignColumns: [stages.id, stages.workshopId] }),
    check('tasks_title_not_blank', sql`length(trim(${t.title})) > 0`),
    check('tasks_estimate_range', sql`${t.estimatedMinutes} is null or ${t.estimatedMinutes} between 0 and 30000`),
    check('tasks_position_non_negative', sql`${t.position} >= 0`),
    check('tasks_version_positive', sql`${t.version} >= 1`),
    index().on(t.jobId),
    index().on(t.workshopId, t.status),
  ],
);

/** Technicians assigned to a task. */
export const taskAssignees = pgTable(
  'task_assignees',
  {
    taskId: uuid().notNull(),
    workshopId: workshopId(),
    userId: uuid().notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.taskId, t.userId] }),
    foreignKey({ name: 'task_assignees_task_same_workshop', columns: [t.taskId, t.workshopId], foreignColumns: [tasks.id, tasks.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'task_assignees_member_same_workshop', columns: [t.workshopId, t.userId], foreignColumns: [memberships.workshopId, memberships.userId] }).onDelete('cascade'),
    index().on(t.workshopId, t.userId),
  ],
);

/** At most one template per stage: the tasks added to a job when it enters that stage. */
export const taskTemplates = pgTable(
  'task_templates',
  {
    id: id(),
    workshopId: workshopId(),
    stageId: uuid().notNull(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('task_templates_stage').on(t.stageId),
    unique('task_templates_id_workshop').on(t.id, t.workshopId),
    foreignKey({ name: 'task_templates_stage_same_workshop', columns: [t.stageId, t.workshopId], foreignColumns: [stages.id, stages.workshopId] }).onDelete('cascade'),
  ],
);

export const taskTemplateItems = pgTable(
  'task_template_items',
  {
    id: id(),
    workshopId: workshopId(),
    templateId: uuid().notNull(),
    title: text().notNull(),
    estimatedMinutes: integer(),
    position: integer().notNull(),
  },
  (t) => [
    unique('task_template_items_position').on(t.templateId, t.position),
    foreignKey({ name: 'task_template_items_template_same_workshop', columns: [t.templateId, t.workshopId], foreignColumns: [taskTemplates.id, taskTemplates.workshopId] }).onDelete('cascade'),
    check('task_template_items_title_not_blank', sql`length(trim(${t.title})) > 0`),
    check('task_template_items_estimate_range', sql`${t.estimatedMinutes} is null or ${t.estimatedMinutes} between 0 and 30000`),
    check('task_template_items_position_non_negative', sql`${t.position} >= 0`),
  ],
);

/** A browser paired as the workshop's wall screen. Only the SHA-256 of its device token is stored. */
export const wallDevices = pgTable(
  'wall_devices',
  {
    id: id(),
    workshopId: workshopId(),
    name: text().notNull(),
    tokenHash: text().notNull().unique(),
    pairedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    lastSeenAt: instant(),
    revokedAt: instant(),
    revokedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    unique('wall_devices_id_workshop').on(t.id, t.workshopId),
    check('wall_devices_name_not_blank', sql`length(trim(${t.name})) > 0`),
    index().on(t.workshopId),
  ],
);

/**
 * A clock grant from a PIN check at a wall screen: lets that screen send, without the PIN, the
 * clock actions the technician made in that PIN session while the network was down. Only the
 * SHA-256 of its token is stored. Device and technician stay in the grant's workshop (composite
 * keys); the grant goes with either. It lasts 24 hours from issue; a PIN change or lock deletes it.
 */
export const wallClockGrants = pgTable(
  'wall_clock_grants',
  {
    id: id(),
    workshopId: workshopId(),
    deviceId: uuid().notNull(),
    technicianId: uuid().notNull(),
    tokenHash: text().notNull(),
    issuedAt: instant().notNull(),
    expiresAt: instant().notNull(),
  },
  (t) => [
    unique('wall_clock_grants_token_hash').on(t.tokenHash),
    foreignKey({ name: 'wall_clock_grants_device_same_workshop', columns: [t.deviceId, t.workshopId], foreignColumns: [wallDevices.id, wallDevices.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'wall_clock_grants_technician_same_workshop', columns: [t.workshopId, t.technicianId], foreignColumns: [memberships.workshopId, memberships.userId] }).onDelete('cascade'),
    check('wall_clock_grants_lasts_24_hours', sql`${t.expiresAt} = ${t.issuedAt} + interval '24 hours'`),
    check('wall_clock_grants_token_hash_sha256', sql`${t.tokenHash} ~ '^[0-9a-f]{64}$'`),
    index().on(t.workshopId, t.technicianId),
    index().on(t.deviceId),
  ],
);

export const securityEventKindEnum = pgEnum('security_event_kind', [
  'pin_failed',
  'pin_locked',
  'pin_unlocked',
  'pin_set',
  'wall_paired',
  'wall_revoked',
  'wall_pin_limit',
]);

/** Security-relevant happenings, kept for the owner. `detail` never holds a PIN, token or password. */
export const securityEvents = pgTable(
  'security_events',
  {
    id: id(),
    workshopId: workshopId(),
    kind: securityEventKindEnum().notNull(),
    membershipId: uuid(),
    deviceId: uuid(),
    actorUserId: uuid().references(() => users.id, { onDelete: 'set null' }),
    at: instant().notNull().defaultNow(),
    detail: jsonb().$type<Record<string, string | number | boolean | null>>().notNull().default({}),
  },
  (t) => [
    foreignKey({ name: 'security_events_member_same_workshop', columns: [t.membershipId, t.workshopId], foreignColumns: [memberships.id, memberships.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'security_events_device_same_workshop', columns: [t.deviceId, t.workshopId], foreignColumns: [wallDevices.id, wallDevices.workshopId] }).onDelete('cascade'),
    index().on(t.deviceId, t.kind, t.at),
    index().on(t.workshopId, t.at),
  ],
);

export const timeEntrySourceEnum = pgEnum('time_entry_source', ['wall', 'web', 'correction']);

/**
 * Time a technician spent on a task. Running while `ended_at` is null. At most one running entry
 * per technician (partial unique index) and no two of one technician's entries overlap (exclusion
 * constraint in the custom migration). `idempotency_key` belongs to the clock-on that started the
 * entry, `stop_idempotency_key` to the clock-off that ended it.
 */
export const timeEntries = pgTable(
  'time_entries',
  {
    id: id(),
    workshopId: workshopId(),
    technicianId: uuid().notNull(),
    taskId: uuid().notNull(),
    jobId: uuid().notNull(),
    startedAt: instant().notNull(),
    endedAt: instant(),
    source: timeEntrySourceEnum().notNull(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    deviceId: uuid(),
    needsReview: boolean().notNull().default(false),
    reviewReason: text(),
    idempotencyKey: text(),
    stopIdempotencyKey: text(),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('time_entries_id_workshop').on(t.id, t.workshopId),
    unique('time_entries_idempotency_key').on(t.workshopId, t.idempotencyKey),
    unique('time_entries_stop_idempotency_key').on(t.workshopId, t.stopIdempotencyKey),
    uniqueIndex('time_entries_one_running_per_technician').on(t.workshopId, t.technicianId).where(sql`${t.endedAt} is null`),
    foreignKey({ name: 'time_entries_technician_same_workshop', columns: [t.workshopId, t.technicianId], foreignColumns: [memberships.workshopId, memberships.userId] }),
    foreignKey({ name: 'time_entries_task_same_job_and_workshop', columns: [t.taskId, t.jobId, t.workshopId], foreignColumns: [tasks.id, tasks.jobId, tasks.workshopId] }),
    foreignKey({ name: 'time_entries_device_same_workshop', columns: [t.deviceId, t.workshopId], foreignColumns: [wallDevices.id, wallDevices.workshopId] }),
    check('time_entries_ends_after_start', sql`${t.endedAt} is null or ${t.endedAt} > ${t.startedAt}`),
    check('time_entries_review_has_reason', sql`not ${t.needsReview} or length(trim(coalesce(${t.reviewReason}, ''))) > 0`),
    index().on(t.workshopId, t.technicianId, t.startedAt),
    index().on(t.jobId),
    index().on(t.taskId),
  ],
);

/** Every correction of an entry: old and new values, why, who and when. */
export const timeEntryCorrections = pgTable(
  'time_entry_corrections',
  {
    id: id(),
    workshopId: workshopId(),
    entryId: uuid().notNull(),
    reason: text().notNull(),
    byUserId: uuid().references(() => users.id, { onDelete: 'set null' }),
    at: instant().notNull().defaultNow(),
    oldStartedAt: instant().notNull(),
    oldEndedAt: instant(),
    oldTaskId: uuid().notNull(),
    newStartedAt: instant().notNull(),
    newEndedAt: instant(),
    newTaskId: uuid().notNull(),
  },
  (t) => [
    foreignKey({ name: 'time_entry_corrections_entry_same_workshop', columns: [t.entryId, t.workshopId], foreignColumns: [timeEntries.id, timeEntries.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'time_entry_corrections_old_task_same_workshop', columns: [t.oldTaskId, t.workshopId], foreignColumns: [tasks.id, tasks.workshopId] }),
    foreignKey({ name: 'time_entry_corrections_new_task_same_workshop', columns: [t.newTaskId, t.workshopId], foreignColumns: [tasks.id, tasks.workshopId] }),
    check('time_entry_corrections_reason_not_blank', sql`length(trim(${t.reason})) > 0`),
    index().on(t.entryId, t.at),
  ],
);

/** A technician's week (Monday, local date) approved by the foreman or owner: locked against edits except by the owner. */
export const timesheetWeeks = pgTable(
  'timesheet_weeks',
  {
    id: id(),
    workshopId: workshopId(),
    technicianId: uuid().notNull(),
    weekStart: date({ mode: 'string' }).notNull(),
    approvedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    approvedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('timesheet_weeks_one_per_week').on(t.workshopId, t.technicianId, t.weekStart),
    foreignKey({ name: 'timesheet_weeks_technician_same_workshop', columns: [t.workshopId, t.technicianId], foreignColumns: [memberships.workshopId, memberships.userId] }),
    check('timesheet_weeks_starts_monday', sql`extract(isodow from ${t.weekStart}) = 1`),
  ],
);
