import { sql } from 'drizzle-orm';
import { boolean, check, integer, pgTable, smallint, text } from 'drizzle-orm/pg-core';
import { createdAt, id } from './columns';

export const workshops = pgTable(
  'workshops',
  {
    id: id(),
    name: text().notNull(),
    /** ISO 4217 alphabetic code. */
    currency: text().notNull().default('GBP'),
    /** IANA time zone name; day boundaries and reports use it. */
    timeZone: text().notNull().default('Europe/London'),
    /** Local wall-clock time ("HH:MM", 24-hour) at which entries still running are stopped and flagged for review. */
    benchDayClose: text().notNull().default('19:00'),
    /** Tax on estimates and invoices, basis points of the net (2000 = 20 %). */
    taxRateBasisPoints: integer().notNull().default(0),
    /** What an hour of labour is charged at on estimates, minor units. */
    labourRateMinorPerHour: integer().notNull().default(0),
    /** Jobs whose forecast margin falls below this are flagged (basis points of the price). */
    targetMarginBasisPoints: integer().notNull().default(0),
    /** When false (the default), stock on hand can never go below zero. */
    allowNegativeStock: boolean().notNull().default(false),
    /** The working day, local wall clock "HH:MM", for utilisation. */
    workingDayStart: text().notNull().default('08:00'),
    workingDayEnd: text().notNull().default('17:30'),
    /** ISO weekdays worked (1 = Monday … 7 = Sunday). */
    workingWeekdays: smallint().array().notNull().default(sql`'{1,2,3,4,5}'::smallint[]`),
    createdAt: createdAt(),
  },
  (t) => [
    check('workshops_name_not_blank', sql`length(trim(${t.name})) > 0`),
    check('workshops_currency_iso4217', sql`${t.currency} ~ '^[A-Z]{3}$'`),
    check('workshops_bench_day_close_hhmm', sql`${t.benchDayClose} ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$'`),
    check('workshops_tax_rate_range', sql`${t.taxRateBasisPoints} between 0 and 10000`),
    check('workshops_labour_rate_non_negative', sql`${t.labourRateMinorPerHour} >= 0`),
    check('workshops_target_margin_range', sql`${t.targetMarginBasisPoints} between 0 and 9999`),
    check('workshops_working_day_hhmm', sql`${t.workingDayStart} ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$' and ${t.workingDayEnd} ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$'`),
    check('workshops_working_day_order', sql`${t.workingDayStart} < ${t.workingDayEnd}`),
    check('workshops_working_weekdays', sql`cardinality(${t.workingWeekdays}) between 1 and 7 and ${t.workingWeekdays} <@ '{1,2,3,4,5,6,7}'::smallint[]`),
  ],
);
