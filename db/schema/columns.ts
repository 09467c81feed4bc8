import { timestamp, uuid } from 'drizzle-orm/pg-core';

/** Primary key: a random UUID made by PostgreSQL. */
export const id = () => uuid().primaryKey().defaultRandom();

/** A point in time, stored as timestamptz and read as a JS Date. */
export const instant = () => timestamp({ withTimezone: true, mode: 'date' });

export const createdAt = () => instant().notNull().defaultNow();
