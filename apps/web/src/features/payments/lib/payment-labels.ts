import type { Payment } from '@keybed/shared';

const KINDS: Record<Payment['kind'], string> = { deposit: 'Deposit by card' };

/** What a payment is and where it stands, in words ("Deposit by card"; "Paid" or "Waiting for the card payment"). */
export function paymentSummary(payment: Pick<Payment, 'kind' | 'status'>): { kind: string; status: string } {
  return { kind: KINDS[payment.kind], status: payment.status === 'paid' ? 'Paid' : 'Waiting for the card payment' };
}
