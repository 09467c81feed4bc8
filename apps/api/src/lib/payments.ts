import Stripe from 'stripe';
import type { Config } from '../config/env';

/**
 * Card payments through the Stripe SDK. In development and tests the SDK talks to our local fake
 * payment server (scripts/fakes/payments.mjs) through its host, port and protocol options.
 */
export function createPaymentsClient(payments: NonNullable<Config['payments']>) {
  const stripe = new Stripe(payments.secretKey, {
    host: payments.host,
    port: payments.port,
    protocol: payments.protocol,
    maxNetworkRetries: 1,
    timeout: 10_000,
  });
  return {
    /** A hosted checkout page for one amount; the provider sends `checkout.session.completed` once paid. */
    createCheckout: (input: { amountMinor: number; currency: string; description: string; paymentId: string; successUrl: string; cancelUrl: string; email?: string }) =>
      stripe.checkout.sessions.create(
        {
          mode: 'payment',
          line_items: [{ quantity: 1, price_data: { currency: input.currency.toLowerCase(), unit_amount: input.amountMinor, product_data: { name: input.description } } }],
          client_reference_id: input.paymentId,
          metadata: { paymentId: input.paymentId },
          customer_email: input.email,
          success_url: input.successUrl,
          cancel_url: input.cancelUrl,
        },
        // The same payment asks for the same session, however often the button is pressed.
        { idempotencyKey: `deposit-${input.paymentId}-${input.amountMinor}` },
      ),

    retrieveCheckout: (id: string) => stripe.checkout.sessions.retrieve(id),

    /** Checks the signature header over the exact raw body; throws on a forged, altered or stale event. */
    verifyEvent: (rawBody: Buffer, signature: string) => stripe.webhooks.constructEvent(rawBody, signature, payments.webhookSecret, 300),
  };
}

export type PaymentsClient = ReturnType<typeof createPaymentsClient>;
