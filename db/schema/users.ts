import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, pgEnum, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, instant } from './columns';
import { workshops } from './workshops';

export const roleEnum = pgEnum('role', ['owner', 'foreman', 'technician']);

export const users = pgTable(
  'users',
  {
    id: id(),
    /** Stored lower-cased; unique across Keybed. */
    email: text().notNull().unique(),
    name: text().notNull(),
    /** argon2id PHC string; never logged, never sent. */
    passwordHash: text().notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    check('users_email_lower', sql`${t.email} = lower(${t.email})`),
    check('users_name_not_blank', sql`length(trim(${t.name})) > 0`),
  ],
);

export const memberships = pgTable(
  'memberships',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: roleEnum().notNull(),
    isActive: boolean().notNull().default(true),
    createdAt: createdAt(),
    /** The wall-screen PIN as an argon2id PHC string; never logged, never sent. */
    pinHash: text(),
    pinSetAt: instant(),
    /** Wrong PINs in a row; reset by a right one, by the lock, or by an unlock. */
    pinFailedCount: integer().notNull().default(0),
    /** While in the future, the wall screen refuses this member's PIN. */
    pinLockedUntil: instant(),
  },
  (t) => [
    unique('memberships_workshop_user').on(t.workshopId, t.userId),
    unique('memberships_id_workshop').on(t.id, t.workshopId),
    index().on(t.userId),
    check('memberships_pin_failed_count_non_negative', sql`${t.pinFailedCount} >= 0`),
  ],
);

/**
 * Lucia sessions. `expiresAt` slides while the member is active; `createdAt` bounds the absolute
 * lifetime; `workshopId` is the membership the session acts for.
 */
export const sessions = pgTable(
  'sessions',
  {
    id: text().primaryKey(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    expiresAt: instant().notNull(),
    createdAt: createdAt(),
  },
  (t) => [index().on(t.userId), index().on(t.expiresAt)],
);

/** Single-use links sent by e-mail. Only the SHA-256 of the token is stored. */
export const passwordResets = pgTable('password_resets', {
  id: id(),
  userId: uuid()
    .notNull()
    .references(() => users.id, { onDelete: 'cascade' }),
  tokenHash: text().notNull().unique(),
  expiresAt: instant().notNull(),
  usedAt: instant(),
  createdAt: createdAt(),
});

export const invitations = pgTable(
  'invitations',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    email: text().notNull(),
    role: roleEnum().notNull(),
    tokenHash: text().notNull().unique(),
    invitedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    expiresAt: instant().notNull(),
    acceptedAt: instant(),
    revokedAt: instant(),
    createdAt: createdAt(),
  },
  (t) => [
    check('invitations_email_lower', sql`${t.email} = lower(${t.email})`),
    index().on(t.workshopId),
  ],
);
