import { sql } from 'drizzle-orm';
import { bigint, boolean, check, foreignKey, index, integer, pgEnum, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, instant } from './columns';
import { parts } from './parts';
import { surveyPianoTypeEnum } from './surveys';
import { workshops } from './workshops';

/*
 * The work catalogue: a workshop's standard operations ("Replace hammer set (grand)") with their
 * default lines: labour tasks in minutes, catalogue parts in thousandths of their unit, and sublet
 * work at an agreed price and expected cost (minor units). Preparing an estimate from a survey
 * proposes the operations that remedy the components found wanting.
 */

const workshopId = () =>
  uuid()
    .notNull()
    .references(() => workshops.id, { onDelete: 'cascade' });

export const catalogueLineKindEnum = pgEnum('catalogue_line_kind', ['labour', 'part', 'sublet']);

export const catalogueOperations = pgTable(
  'catalogue_operations',
  {
    id: id(),
    workshopId: workshopId(),
    name: text().notNull(),
    description: text().notNull().default(''),
    /** Null: any piano type. */
    pianoType: surveyPianoTypeEnum(),
    /** Survey component keys this operation remedies ("hammers", "key-bushings"). */
    componentKeys: text().array().notNull().default(sql`'{}'::text[]`),
    isActive: boolean().notNull().default(true),
    version: integer().notNull().default(1),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('catalogue_operations_id_workshop').on(t.id, t.workshopId),
    check('catalogue_operations_name_not_blank', sql`length(trim(${t.name})) > 0`),
    check('catalogue_operations_version_positive', sql`${t.version} >= 1`),
    index('catalogue_operations_name_per_workshop').on(t.workshopId, sql`lower(${t.name})`),
  ],
);

export const catalogueLines = pgTable(
  'catalogue_lines',
  {
    id: id(),
    workshopId: workshopId(),
    operationId: uuid().notNull(),
    position: integer().notNull(),
    kind: catalogueLineKindEnum().notNull(),
    description: text().notNull(),
    minutes: integer(),
    partId: uuid(),
    quantityMilli: bigint({ mode: 'number' }),
    /** Sublet: the price to the client and the supplier's expected cost. */
    unitPriceMinor: bigint({ mode: 'number' }),
    unitCostMinor: bigint({ mode: 'number' }),
    supplier: text(),
  },
  (t) => [
    unique('catalogue_lines_position').on(t.operationId, t.position),
    foreignKey({ name: 'catalogue_lines_operation_same_workshop', columns: [t.operationId, t.workshopId], foreignColumns: [catalogueOperations.id, catalogueOperations.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'catalogue_lines_part_same_workshop', columns: [t.partId, t.workshopId], foreignColumns: [parts.id, parts.workshopId] }),
    check('catalogue_lines_description_not_blank', sql`length(trim(${t.description})) > 0`),
    check('catalogue_lines_position_non_negative', sql`${t.position} >= 0`),
    check(
      'catalogue_lines_kind_rules',
      // coalesce: a NULL would make the whole CHECK unknown, which PostgreSQL lets through.
      sql`case ${t.kind}
        when 'labour' then coalesce(${t.minutes} between 1 and 30000, false) and ${t.partId} is null and ${t.quantityMilli} is null and ${t.unitPriceMinor} is null and ${t.unitCostMinor} is null
        when 'part' then ${t.partId} is not null and coalesce(${t.quantityMilli} > 0, false) and ${t.minutes} is null and ${t.unitPriceMinor} is null and ${t.unitCostMinor} is null
        else coalesce(${t.quantityMilli} > 0 and ${t.unitPriceMinor} >= 0, false) and coalesce(${t.unitCostMinor}, 0) >= 0 and ${t.minutes} is null and ${t.partId} is null
      end`,
    ),
    index().on(t.operationId),
  ],
);
