import { sql } from 'drizzle-orm';
import { bigint, check, foreignKey, index, pgEnum, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { jobs } from './board';
import { createdAt, id, instant } from './columns';
import { estimates } from './estimates';
import { workshops } from './workshops';

/*
 * Money received from clients by card. A payment starts pending with the card provider's checkout
 * session and becomes paid when the provider's signed event says so. Every provider event is kept
 * by its id, so a replayed event changes nothing.
 */

export const paymentKindEnum = pgEnum('payment_kind', ['deposit']);
export const paymentStatusEnum = pgEnum('payment_status', ['pending', 'paid']);

export const payments = pgTable(
  'payments',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    jobId: uuid().notNull(),
    estimateId: uuid().notNull(),
    kind: paymentKindEnum().notNull(),
    status: paymentStatusEnum().notNull().default('pending'),
    amountMinor: bigint({ mode: 'number' }).notNull(),
    /** ISO 4217, as charged. */
    currency: text().notNull(),
    checkoutSessionId: text(),
    checkoutUrl: text(),
    /** The provider's reference for the money moved (payment intent). */
    providerReference: text(),
    paidAt: instant(),
    createdAt: createdAt(),
  },
  (t) => [
    foreignKey({ name: 'payments_job_same_workshop', columns: [t.jobId, t.workshopId], foreignColumns: [jobs.id, jobs.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'payments_estimate_same_workshop', columns: [t.estimateId, t.workshopId], foreignColumns: [estimates.id, estimates.workshopId] }).onDelete('cascade'),
    uniqueIndex('payments_checkout_session').on(t.checkoutSessionId),
    // One deposit per accepted estimate: paid once, and at most one checkout waiting.
    uniqueIndex('payments_one_deposit_per_estimate').on(t.estimateId).where(sql`${t.kind} = 'deposit'`),
    check('payments_amount_positive', sql`${t.amountMinor} > 0`),
    check('payments_currency_iso4217', sql`${t.currency} ~ '^[A-Z]{3}$'`),
    check('payments_paid_has_time', sql`(${t.status} = 'paid') = (${t.paidAt} is not null)`),
    index().on(t.jobId),
  ],
);

/** Every event the card provider sent that passed the signature check, by the provider's event id. */
export const paymentEvents = pgTable('payment_events', {
  eventId: text().primaryKey(),
  type: text().notNull(),
  paymentId: uuid().references(() => payments.id, { onDelete: 'set null' }),
  receivedAt: instant().notNull().defaultNow(),
});
