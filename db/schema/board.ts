import { sql } from 'drizzle-orm';
import { boolean, check, date, foreignKey, index, integer, pgEnum, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { clients, pianos } from './clients';
import { createdAt, id, instant } from './columns';
import { users } from './users';
import { workshops } from './workshops';

/**
 * A workshop's stages, in board order. Positions are unique per workshop (a deferred constraint,
 * added in the migration, so a reorder can swap them inside one transaction).
 */
export const stages = pgTable(
  'stages',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    position: integer().notNull(),
    /** Work-in-progress limit: how many jobs the stage should hold at most; null for none. */
    wipLimit: integer(),
    archivedAt: instant(),
    createdAt: createdAt(),
  },
  (t) => [
    unique('stages_id_workshop').on(t.id, t.workshopId),
    check('stages_name_not_blank', sql`length(trim(${t.name})) > 0`),
    check('stages_position_non_negative', sql`${t.position} >= 0`),
    check('stages_wip_limit_positive', sql`${t.wipLimit} is null or ${t.wipLimit} > 0`),
  ],
);

export const jobStatusEnum = pgEnum('job_status', ['active', 'on_hold', 'done', 'cancelled', 'proposed']);
export const jobPriorityEnum = pgEnum('job_priority', ['low', 'normal', 'high', 'urgent']);

/**
 * One piano's restoration. A job on the board (active or on hold) has a position in its stage;
 * positions in a stage are unique (deferred constraint in the migration) and kept 0..n-1 by moves.
 */
export const jobs = pgTable(
  'jobs',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    clientId: uuid().notNull(),
    pianoId: uuid().notNull(),
    stageId: uuid().notNull(),
    position: integer(),
    title: text().notNull(),
    status: jobStatusEnum().notNull().default('active'),
    priority: jobPriorityEnum().notNull().default('normal'),
    promisedOn: date({ mode: 'string' }),
    isBlocked: boolean().notNull().default(false),
    blockedReason: text(),
    notes: text().notNull().default(''),
    /** Optimistic-concurrency version: every change adds one; writes carry the version they read. */
    version: integer().notNull().default(1),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('jobs_id_workshop').on(t.id, t.workshopId),
    foreignKey({ name: 'jobs_client_same_workshop', columns: [t.clientId, t.workshopId], foreignColumns: [clients.id, clients.workshopId] }),
    foreignKey({ name: 'jobs_piano_same_workshop', columns: [t.pianoId, t.workshopId], foreignColumns: [pianos.id, pianos.workshopId] }),
    foreignKey({ name: 'jobs_stage_same_workshop', columns: [t.stageId, t.workshopId], foreignColumns: [stages.id, stages.workshopId] }),
    check('jobs_title_not_blank', sql`length(trim(${t.title})) > 0`),
    check('jobs_position_when_on_board', sql`(${t.status} in ('active', 'on_hold')) = (${t.position} is not null)`),
    check('jobs_position_non_negative', sql`${t.position} is null or ${t.position} >= 0`),
    check('jobs_blocked_has_reason', sql`not ${t.isBlocked} or length(trim(coalesce(${t.blockedReason}, ''))) > 0`),
    check('jobs_version_positive', sql`${t.version} >= 1`),
    index().on(t.workshopId, t.status),
    index().on(t.pianoId),
    // The board reads only jobs on it; finished jobs pile up behind them over the years.
    index('jobs_on_board').on(t.workshopId, t.stageId, t.position).where(sql`${t.position} is not null`),
  ],
);

/** Every stage change of a job, kept for time-in-stage reports. */
export const jobStageEvents = pgTable(
  'job_stage_events',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    jobId: uuid().notNull(),
    fromStageId: uuid(),
    toStageId: uuid().notNull(),
    byUserId: uuid().references(() => users.id, { onDelete: 'set null' }),
    at: instant().notNull().defaultNow(),
  },
  (t) => [
    foreignKey({ name: 'job_stage_events_job_same_workshop', columns: [t.jobId, t.workshopId], foreignColumns: [jobs.id, jobs.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'job_stage_events_from_same_workshop', columns: [t.fromStageId, t.workshopId], foreignColumns: [stages.id, stages.workshopId] }),
    foreignKey({ name: 'job_stage_events_to_same_workshop', columns: [t.toStageId, t.workshopId], foreignColumns: [stages.id, stages.workshopId] }),
    // A job's first event has no `from`; every later one is a real change of stage.
    check('job_stage_events_changes_stage', sql`${t.fromStageId} is null or ${t.fromStageId} <> ${t.toStageId}`),
    index().on(t.jobId, t.at),
  ],
);
