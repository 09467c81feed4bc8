import { sql } from 'drizzle-orm';
import { bigint, boolean, check, foreignKey, index, integer, pgEnum, pgTable, text, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { tasks } from './bench';
import { createdAt, id, instant } from './columns';
import { users } from './users';
import { workshops } from './workshops';

/*
 * Parts catalogue and the stock ledger. Quantities are integer thousandths of the part's unit;
 * money integer minor units. Stock on hand is the sum of a part's movements; the custom migration
 * adds the trigger that keeps it at or above zero unless the workshop allows negative stock.
 */

const workshopId = () =>
  uuid()
    .notNull()
    .references(() => workshops.id, { onDelete: 'cascade' });

export const parts = pgTable(
  'parts',
  {
    id: id(),
    workshopId: workshopId(),
    sku: text().notNull(),
    name: text().notNull(),
    unit: text().notNull(),
    supplier: text().notNull().default(''),
    /** Catalogue cost of one unit (what a delivery costs when none is stated). */
    unitCostMinor: bigint({ mode: 'number' }).notNull(),
    /** Fixed sell price of one unit; null when the price is cost plus `markupBasisPoints`. */
    sellPriceMinor: bigint({ mode: 'number' }),
    markupBasisPoints: integer(),
    reorderLevelMilli: bigint({ mode: 'number' }).notNull().default(0),
    isActive: boolean().notNull().default(true),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('parts_id_workshop').on(t.id, t.workshopId),
    uniqueIndex('parts_sku_per_workshop').on(t.workshopId, sql`lower(${t.sku})`),
    check('parts_sku_not_blank', sql`length(trim(${t.sku})) > 0`),
    check('parts_name_not_blank', sql`length(trim(${t.name})) > 0`),
    check('parts_unit_not_blank', sql`length(trim(${t.unit})) > 0`),
    check('parts_unit_cost_non_negative', sql`${t.unitCostMinor} >= 0`),
    check('parts_one_price_rule', sql`(${t.sellPriceMinor} is null) <> (${t.markupBasisPoints} is null)`),
    check('parts_sell_price_non_negative', sql`${t.sellPriceMinor} is null or ${t.sellPriceMinor} >= 0`),
    check('parts_markup_non_negative', sql`${t.markupBasisPoints} is null or ${t.markupBasisPoints} >= 0`),
    check('parts_reorder_level_non_negative', sql`${t.reorderLevelMilli} >= 0`),
  ],
);

export const stockMovementKindEnum = pgEnum('stock_movement_kind', ['received', 'used', 'returned', 'adjusted']);

/**
 * One change to a part's stock. `quantity_milli` is signed (into stock above zero); `value_minor`
 * is the stock value it moved, signed the same way, so the stock's value is the sum too and the
 * weighted average never drifts. `unit_cost_minor` is the unit cost at the time, for reading.
 * Used and returned movements name the task (and its job) they were for; adjustments their reason.
 */
export const stockMovements = pgTable(
  'stock_movements',
  {
    id: id(),
    workshopId: workshopId(),
    partId: uuid().notNull(),
    kind: stockMovementKindEnum().notNull(),
    quantityMilli: bigint({ mode: 'number' }).notNull(),
    unitCostMinor: bigint({ mode: 'number' }).notNull(),
    valueMinor: bigint({ mode: 'number' }).notNull(),
    taskId: uuid(),
    jobId: uuid(),
    reason: text(),
    byUserId: uuid().references(() => users.id, { onDelete: 'set null' }),
    at: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('stock_movements_id_workshop').on(t.id, t.workshopId),
    foreignKey({ name: 'stock_movements_part_same_workshop', columns: [t.partId, t.workshopId], foreignColumns: [parts.id, parts.workshopId] }),
    foreignKey({ name: 'stock_movements_task_same_job_and_workshop', columns: [t.taskId, t.jobId, t.workshopId], foreignColumns: [tasks.id, tasks.jobId, tasks.workshopId] }),
    check('stock_movements_quantity_not_zero', sql`${t.quantityMilli} <> 0`),
    check('stock_movements_unit_cost_non_negative', sql`${t.unitCostMinor} >= 0`),
    check('stock_movements_value_same_sign', sql`(${t.quantityMilli} > 0 and ${t.valueMinor} >= 0) or (${t.quantityMilli} < 0 and ${t.valueMinor} <= 0)`),
    check('stock_movements_task_with_job', sql`(${t.taskId} is null) = (${t.jobId} is null)`),
    check(
      'stock_movements_kind_rules',
      sql`case ${t.kind}
        when 'received' then ${t.quantityMilli} > 0 and ${t.taskId} is null
        when 'used' then ${t.quantityMilli} < 0 and ${t.taskId} is not null
        when 'returned' then ${t.quantityMilli} > 0 and ${t.taskId} is not null
        else length(trim(coalesce(${t.reason}, ''))) >= 3
      end`,
    ),
    index().on(t.partId, t.at),
    index().on(t.jobId),
    index().on(t.taskId),
  ],
);
