import { sql } from 'drizzle-orm';
import { bigint, boolean, check, foreignKey, index, integer, pgEnum, pgTable, text, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { tasks } from './bench';
import { jobs } from './board';
import { createdAt, id, instant } from './columns';
import { parts } from './parts';
import { users } from './users';
import { workshops } from './workshops';

/*
 * Estimates: numbered revisions per job, their options (alternatives grouped by choice) and lines.
 * Lines and options of an estimate that is no longer a draft are frozen by a trigger in the custom
 * migration (only a labour line's new task and an option's chosen flag may be set on acceptance).
 */

const workshopId = () =>
  uuid()
    .notNull()
    .references(() => workshops.id, { onDelete: 'cascade' });

export const estimateStatusEnum = pgEnum('estimate_status', ['draft', 'issued', 'accepted', 'declined', 'superseded']);
export const estimateKindEnum = pgEnum('estimate_kind', ['original', 'variation']);
export const estimateLineKindEnum = pgEnum('estimate_line_kind', ['labour', 'part', 'sublet', 'other']);

export const estimates = pgTable(
  'estimates',
  {
    id: id(),
    workshopId: workshopId(),
    jobId: uuid().notNull(),
    revision: integer().notNull(),
    kind: estimateKindEnum().notNull(),
    status: estimateStatusEnum().notNull().default('draft'),
    title: text().notNull().default(''),
    notes: text().notNull().default(''),
    version: integer().notNull().default(1),
    /** The agreed price ex tax of the chosen scope, fixed when accepted. */
    acceptedNetMinor: bigint({ mode: 'number' }),
    issuedAt: instant(),
    acceptedAt: instant(),
    acceptedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    declinedAt: instant(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('estimates_id_workshop').on(t.id, t.workshopId),
    unique('estimates_id_job').on(t.id, t.jobId),
    unique('estimates_revision_per_job').on(t.jobId, t.revision),
    uniqueIndex('estimates_one_accepted_original').on(t.jobId).where(sql`${t.kind} = 'original' and ${t.status} = 'accepted'`),
    foreignKey({ name: 'estimates_job_same_workshop', columns: [t.jobId, t.workshopId], foreignColumns: [jobs.id, jobs.workshopId] }).onDelete('cascade'),
    check('estimates_revision_positive', sql`${t.revision} >= 1`),
    check('estimates_version_positive', sql`${t.version} >= 1`),
    check('estimates_issued_when_not_draft', sql`(${t.status} = 'draft') = (${t.issuedAt} is null) or ${t.status} = 'superseded'`),
    check('estimates_accepted_has_price', sql`(${t.status} = 'accepted') = (${t.acceptedAt} is not null and ${t.acceptedNetMinor} is not null)`),
    check('estimates_accepted_net_non_negative', sql`${t.acceptedNetMinor} is null or ${t.acceptedNetMinor} >= 0`),
    check('estimates_declined_has_time', sql`(${t.status} = 'declined') = (${t.declinedAt} is not null)`),
    index().on(t.workshopId, t.status),
  ],
);

export const estimateOptions = pgTable(
  'estimate_options',
  {
    id: id(),
    workshopId: workshopId(),
    estimateId: uuid().notNull(),
    key: text().notNull(),
    choice: text().notNull(),
    name: text().notNull(),
    position: integer().notNull(),
    isChosen: boolean().notNull().default(false),
  },
  (t) => [
    unique('estimate_options_id_estimate').on(t.id, t.estimateId),
    unique('estimate_options_key').on(t.estimateId, t.key),
    unique('estimate_options_position').on(t.estimateId, t.position),
    foreignKey({ name: 'estimate_options_estimate_same_workshop', columns: [t.estimateId, t.workshopId], foreignColumns: [estimates.id, estimates.workshopId] }).onDelete('cascade'),
    check('estimate_options_choice_not_blank', sql`length(trim(${t.choice})) > 0`),
    check('estimate_options_name_not_blank', sql`length(trim(${t.name})) > 0`),
    check('estimate_options_position_non_negative', sql`${t.position} >= 0`),
  ],
);

/**
 * One line. Labour: minutes at an hourly price, optionally a task of the same job. Other kinds: a
 * quantity in thousandths at a unit price; parts name a catalogue part. `amount_minor` and
 * `cost_minor` are the line's rounded price and expected cost, computed by the shared estimate
 * functions when the line is saved (lines are frozen once issued).
 */
export const estimateLines = pgTable(
  'estimate_lines',
  {
    id: id(),
    workshopId: workshopId(),
    estimateId: uuid().notNull(),
    jobId: uuid().notNull(),
    position: integer().notNull(),
    kind: estimateLineKindEnum().notNull(),
    description: text().notNull(),
    taskId: uuid(),
    partId: uuid(),
    optionId: uuid(),
    minutes: integer(),
    quantityMilli: bigint({ mode: 'number' }),
    unitPriceMinor: bigint({ mode: 'number' }).notNull(),
    unitCostMinor: bigint({ mode: 'number' }),
    amountMinor: bigint({ mode: 'number' }).notNull(),
    costMinor: bigint({ mode: 'number' }),
  },
  (t) => [
    unique('estimate_lines_position').on(t.estimateId, t.position),
    foreignKey({ name: 'estimate_lines_estimate_same_job', columns: [t.estimateId, t.jobId], foreignColumns: [estimates.id, estimates.jobId] }).onDelete('cascade'),
    foreignKey({ name: 'estimate_lines_estimate_same_workshop', columns: [t.estimateId, t.workshopId], foreignColumns: [estimates.id, estimates.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'estimate_lines_option_same_estimate', columns: [t.optionId, t.estimateId], foreignColumns: [estimateOptions.id, estimateOptions.estimateId] }),
    foreignKey({ name: 'estimate_lines_task_same_job', columns: [t.taskId, t.jobId, t.workshopId], foreignColumns: [tasks.id, tasks.jobId, tasks.workshopId] }),
    foreignKey({ name: 'estimate_lines_part_same_workshop', columns: [t.partId, t.workshopId], foreignColumns: [parts.id, parts.workshopId] }),
    check('estimate_lines_description_not_blank', sql`length(trim(${t.description})) > 0`),
    check('estimate_lines_position_non_negative', sql`${t.position} >= 0`),
    check(
      'estimate_lines_kind_rules',
      sql`case when ${t.kind} = 'labour'
        then ${t.minutes} > 0 and ${t.quantityMilli} is null and ${t.partId} is null and ${t.unitCostMinor} is null and ${t.costMinor} is null
        else ${t.quantityMilli} > 0 and ${t.minutes} is null and ${t.taskId} is null and (${t.kind} = 'part') = (${t.partId} is not null)
      end`,
    ),
    check('estimate_lines_money_non_negative', sql`${t.unitPriceMinor} >= 0 and ${t.amountMinor} >= 0 and coalesce(${t.unitCostMinor}, 0) >= 0 and coalesce(${t.costMinor}, 0) >= 0`),
    check('estimate_lines_cost_with_unit_cost', sql`(${t.unitCostMinor} is null) = (${t.costMinor} is null)`),
    index().on(t.estimateId),
    index().on(t.taskId),
    index().on(t.jobId),
  ],
);
