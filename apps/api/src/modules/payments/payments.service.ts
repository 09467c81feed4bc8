import type { JobPayments, Payment } from '@keybed/shared';
import { AppError } from '../../http/errors';
import { notifyLive, type Changed } from '../../lib/live-events';
import type { Logger } from '../../lib/logger';
import type { PaymentsClient } from '../../lib/payments';
import type { PaymentRow, PaymentsRepo } from './payments.repo';

interface Deps {
  repo: PaymentsRepo;
  client: PaymentsClient | null;
  logger: Logger;
  now: () => Date;
  changed: Changed;
}

export const toPayment = (p: PaymentRow): Payment => ({
  id: p.id,
  estimateId: p.estimateId,
  kind: p.kind,
  status: p.status,
  amountMinor: p.amountMinor,
  currency: p.currency,
  paidAt: p.paidAt?.toISOString() ?? null,
  createdAt: p.createdAt.toISOString(),
});

const badEvent = (message: string) => new AppError('validation_failed', 400, message);

/**
 * Deposits by card. A checkout session per deposit; the provider's signed event marks it paid.
 * Events are kept by id in the same transaction as their effect, so a replay changes nothing.
 */
export function createPaymentsService({ repo, client, logger, now, changed }: Deps) {
  return {
    isAvailable: () => client !== null,

    async startDeposit(v: { workshopId: string; jobId: string; estimateId: string; amountMinor: number; currency: string; description: string; successUrl: string; cancelUrl: string; email?: string }) {
      if (!client) throw new AppError('service_unavailable', 503, 'Card payments are not set up for this workshop. Please contact the workshop to pay the deposit.');
      const payment = await repo.pendingDeposit({ ...v, at: now() });
      if (payment.status === 'paid') throw new AppError('conflict', 409, 'The deposit is already paid. Thank you.');
      const session = await client.createCheckout({ amountMinor: payment.amountMinor, currency: payment.currency, description: v.description, paymentId: payment.id, successUrl: v.successUrl, cancelUrl: v.cancelUrl, email: v.email });
      if (!session.url) throw new AppError('service_unavailable', 503, 'The card payment page could not be opened. Try again in a minute.');
      await repo.setCheckout(payment.id, session.id, session.url);
      return { checkoutUrl: session.url };
    },

    /** `POST /api/webhooks/payments`: verifies the signature over the raw body, then applies the event once. */
    async receive(rawBody: Buffer, signature: string | undefined) {
      if (!client) throw new AppError('service_unavailable', 503, 'Card payments are not set up');
      if (!signature) throw badEvent('The event has no signature');
      let event;
      try {
        event = client.verifyEvent(rawBody, signature);
      } catch {
        throw badEvent('The event signature is not valid or is too old');
      }
      const result = await repo.transaction(async (tx) => {
        if (!(await repo.recordEvent(tx, event.id, event.type))) return { isDuplicate: true, workshopId: null };
        if (event.type !== 'checkout.session.completed') return { isDuplicate: false, workshopId: null };
        const session = event.data.object;
        const paymentId = session.client_reference_id ?? session.metadata?.paymentId;
        if (!paymentId || session.payment_status !== 'paid' || session.amount_total === null || !session.currency) return { isDuplicate: false, workshopId: null };
        const paymentIntent = typeof session.payment_intent === 'string' ? session.payment_intent : (session.payment_intent?.id ?? null);
        const at = now();
        const paid = await repo.markPaid(tx, { sessionId: session.id, paymentId, amountMinor: session.amount_total, currency: session.currency, providerReference: paymentIntent, at });
        if (!paid) {
          logger.warn({ eventId: event.id, sessionId: session.id }, 'a completed checkout matched no pending deposit');
          return { isDuplicate: false, workshopId: null };
        }
        await repo.linkEvent(tx, event.id, paid.id);
        await notifyLive(tx, paid.workshopId, 'costing.changed', paid.jobId, at);
        return { isDuplicate: false, workshopId: paid.workshopId };
      });
      if (result.workshopId) changed(result.workshopId);
      return { received: true, isDuplicate: result.isDuplicate };
    },

    async listForJob(workshopId: string, jobId: string): Promise<JobPayments> {
      const rows = await repo.listForJob(workshopId, jobId);
      return { payments: rows.map(toPayment), receivedMinor: rows.filter((p) => p.status === 'paid').reduce((sum, p) => sum + p.amountMinor, 0) };
    },
  };
}

export type PaymentsService = ReturnType<typeof createPaymentsService>;
