import { sql } from 'drizzle-orm';
import { check, foreignKey, index, integer, pgEnum, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, instant } from './columns';
import { estimates } from './estimates';
import { users } from './users';
import { workshops } from './workshops';

/*
 * The client's private page: a link per issued estimate revision (only the SHA-256 of its token is
 * stored), the client's answer to that exact revision, and what the workshop shows on the page.
 */

const workshopId = () =>
  uuid()
    .notNull()
    .references(() => workshops.id, { onDelete: 'cascade' });

/** What the client's page and the estimate PDF show besides the estimate, and the link and deposit rules. */
export const clientTerms = pgTable(
  'client_terms',
  {
    workshopId: uuid()
      .primaryKey()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    address: text().notNull().default(''),
    phone: text().notNull().default(''),
    email: text().notNull().default(''),
    vatNumber: text().notNull().default(''),
    terms: text().notNull().default(''),
    /** Share of the accepted total asked as a deposit, basis points (3000 = 30 %); 0 asks none. */
    depositBasisPoints: integer().notNull().default(3000),
    /** Days a client's link works after it is sent. */
    linkLifetimeDays: integer().notNull().default(30),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    check('client_terms_deposit_range', sql`${t.depositBasisPoints} between 0 and 10000`),
    check('client_terms_link_lifetime_range', sql`${t.linkLifetimeDays} between 1 and 365`),
  ],
);

export const clientLinks = pgTable(
  'client_links',
  {
    id: id(),
    workshopId: workshopId(),
    estimateId: uuid().notNull(),
    tokenHash: text().notNull().unique(),
    sentTo: text().notNull(),
    sentBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    expiresAt: instant().notNull(),
    revokedAt: instant(),
    lastOpenedAt: instant(),
    createdAt: createdAt(),
  },
  (t) => [
    unique('client_links_id_workshop').on(t.id, t.workshopId),
    foreignKey({ name: 'client_links_estimate_same_workshop', columns: [t.estimateId, t.workshopId], foreignColumns: [estimates.id, estimates.workshopId] }).onDelete('cascade'),
    check('client_links_expiry_after_creation', sql`${t.expiresAt} > ${t.createdAt}`),
    index().on(t.estimateId),
  ],
);

export const clientAnswerEnum = pgEnum('client_answer', ['accepted', 'declined']);

/**
 * The client's answer to one estimate revision, once: who typed their name, from which address,
 * when, which options, and the revision and version they saw.
 */
export const clientResponses = pgTable(
  'client_responses',
  {
    id: id(),
    workshopId: workshopId(),
    linkId: uuid().notNull(),
    estimateId: uuid().notNull(),
    answer: clientAnswerEnum().notNull(),
    revision: integer().notNull(),
    estimateVersion: integer().notNull(),
    optionIds: uuid().array().notNull().default(sql`'{}'::uuid[]`),
    name: text(),
    reason: text(),
    ipAddress: text().notNull(),
    at: instant().notNull(),
  },
  (t) => [
    unique('client_responses_one_per_estimate').on(t.estimateId),
    foreignKey({ name: 'client_responses_link_same_workshop', columns: [t.linkId, t.workshopId], foreignColumns: [clientLinks.id, clientLinks.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'client_responses_estimate_same_workshop', columns: [t.estimateId, t.workshopId], foreignColumns: [estimates.id, estimates.workshopId] }).onDelete('cascade'),
    check('client_responses_accepted_has_name', sql`${t.answer} <> 'accepted' or length(trim(coalesce(${t.name}, ''))) > 0`),
    check('client_responses_revision_positive', sql`${t.revision} >= 1`),
  ],
);
