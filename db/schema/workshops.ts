import { sql } from 'drizzle-orm';
import { check, pgTable, text } from 'drizzle-orm/pg-core';
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
    createdAt: createdAt(),
  },
  (t) => [
    check('workshops_name_not_blank', sql`length(trim(${t.name})) > 0`),
    check('workshops_currency_iso4217', sql`${t.currency} ~ '^[A-Z]{3}$'`),
    check('workshops_bench_day_close_hhmm', sql`${t.benchDayClose} ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$'`),
  ],
);
