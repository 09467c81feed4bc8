import type { ClientPage } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { describeError } from '@/lib/error-messages';
import { isApiError } from '@/lib/api-client';
import { formatDate } from '@/lib/format';
import { formatBasisPoints, formatMinor } from '@/lib/money';
import { useStartDeposit } from '../api/answer-estimate';

interface DepositPanelProps {
  token: string;
  deposit: NonNullable<ClientPage['deposit']>;
  currency: string;
  /** Back from the payment page: how it ended there, and whether we are still waiting to hear. */
  returned: 'paid' | 'cancelled' | null;
  isWaitingTooLong: boolean;
}

/** The deposit after acceptance: pay it by card, wait for the confirmation, or see it received. */
export function DepositPanel({ token, deposit, currency, returned, isWaitingTooLong }: DepositPanelProps) {
  const start = useStartDeposit(token);
  const amount = formatMinor(deposit.amountMinor, currency);
  if (deposit.status === 'paid') {
    return (
      <Alert tone="success" title={`Deposit of ${amount} received${deposit.paidAt ? ` on ${formatDate(deposit.paidAt)}` : ''}.`}>
        <p>Thank you. The workshop will be in touch about collecting the piano.</p>
      </Alert>
    );
  }
  if (returned === 'paid' || deposit.status === 'pending') {
    return (
      <Alert title={isWaitingTooLong ? 'Your payment is not confirmed yet.' : 'Confirming your payment…'}>
        <p>
          {isWaitingTooLong
            ? 'If you completed the payment, it will show here shortly. Reload this page in a few minutes; you will not be charged twice.'
            : 'This takes a few seconds once the card payment is complete.'}
        </p>
      </Alert>
    );
  }
  return (
    <div className="space-y-3">
      {returned === 'cancelled' && <Alert title="The card payment was not completed.">You can try again below; nothing was charged.</Alert>}
      <p>
        The workshop asks a deposit of {formatBasisPoints(deposit.basisPoints).replace('.0 %', ' %')} of the total: <span className="font-semibold tabular-figures">{amount}</span>.
      </p>
      {start.error && (
        <Alert tone="error" title="The payment could not be started.">
          {isApiError(start.error) && start.error.status < 500 ? start.error.message : `${describeError(start.error).title} ${describeError(start.error).action}`}
        </Alert>
      )}
      {deposit.isPayable ? (
        <Button className="w-full" isPending={start.isPending || start.isSuccess} onClick={() => start.mutate(undefined, { onSuccess: ({ checkoutUrl }) => window.location.assign(checkoutUrl) })}>
          Pay the deposit of {amount} by card
        </Button>
      ) : (
        <p className="text-graphite-700">The workshop will tell you how to pay it.</p>
      )}
    </div>
  );
}
