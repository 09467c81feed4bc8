import { and, asc, eq, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { paymentEvents, payments } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

export type PaymentRow = typeof payments.$inferSelect;

export function createPaymentsRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    /** The estimate's deposit row, made pending on first ask (one per estimate, by a unique index). */
    async pendingDeposit(v: { workshopId: string; jobId: string; estimateId: string; amountMinor: number; currency: string; at: Date }) {
      await db
        .insert(payments)
        .values({ workshopId: v.workshopId, jobId: v.jobId, estimateId: v.estimateId, kind: 'deposit', amountMinor: v.amountMinor, currency: v.currency, createdAt: v.at })
        .onConflictDoNothing();
      const [row] = await db.select().from(payments).where(and(eq(payments.estimateId, v.estimateId), eq(payments.kind, 'deposit')));
      return row!;
    },

    async setCheckout(id: string, sessionId: string, url: string) {
      await db.update(payments).set({ checkoutSessionId: sessionId, checkoutUrl: url }).where(and(eq(payments.id, id), eq(payments.status, 'pending')));
    },

    /** Keeps the event id; false when it was already received (a replay). */
    async recordEvent(tx: Tx, eventId: string, type: string) {
      const rows = await tx.insert(paymentEvents).values({ eventId, type }).onConflictDoNothing().returning({ eventId: paymentEvents.eventId });
      return rows.length > 0;
    },

    async linkEvent(tx: Tx, eventId: string, paymentId: string) {
      await tx.update(paymentEvents).set({ paymentId }).where(eq(paymentEvents.eventId, eventId));
    },

    /** Marks the deposit paid by this checkout session (an earlier abandoned session counts too), once; answers the row when it changed. */
    async markPaid(tx: Tx, v: { sessionId: string; paymentId: string; amountMinor: number; currency: string; providerReference: string | null; at: Date }) {
      const [row] = await tx
        .update(payments)
        .set({ status: 'paid', paidAt: v.at, providerReference: v.providerReference, checkoutSessionId: v.sessionId })
        .where(
          and(
            eq(payments.id, v.paymentId),
            eq(payments.status, 'pending'),
            eq(payments.amountMinor, v.amountMinor),
            sql`lower(${payments.currency}) = ${v.currency.toLowerCase()}`,
          ),
        )
        .returning();
      return row;
    },

    listForJob: (workshopId: string, jobId: string) =>
      db.select().from(payments).where(and(eq(payments.workshopId, workshopId), eq(payments.jobId, jobId))).orderBy(asc(payments.createdAt)),
  };
}

export type PaymentsRepo = ReturnType<typeof createPaymentsRepo>;
