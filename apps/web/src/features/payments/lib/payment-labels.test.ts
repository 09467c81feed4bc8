import { describe, expect, it } from 'vitest';
import { paymentSummary } from './payment-labels';

describe('paymentSummary', () => {
  it('when a deposit is paid or still waiting, then it says so in words', () => {
    expect(paymentSummary({ kind: 'deposit', status: 'paid' })).toEqual({ kind: 'Deposit by card', status: 'Paid' });
    expect(paymentSummary({ kind: 'deposit', status: 'pending' })).toEqual({ kind: 'Deposit by card', status: 'Waiting for the card payment' });
  });
});
