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
    createdAt: createdAt(),
  },
  (t) => [
    check('workshops_name_not_blank', sql`length(trim(${t.name})) > 0`),
    check('workshops_currency_iso4217', sql`${t.currency} ~ '^[A-Z]{3}$'`),
  ],
);
