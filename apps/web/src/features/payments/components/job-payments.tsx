import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { formatDate } from '@/lib/format';
import { formatMinor } from '@/lib/money';
import { useJobPayments } from '../api/get-job-payments';
import { paymentSummary } from '../lib/payment-labels';

/** Money the client has paid on the job, and any card payment still waiting (owner). */
export function JobPayments({ jobId }: { jobId: string }) {
  const payments = useJobPayments(jobId);
  if (payments.isPending) {
    return (
      <LoadingRegion label="Loading the payments">
        <Skeleton className="h-16 w-full" />
      </LoadingRegion>
    );
  }
  if (payments.isError) return <ErrorState error={payments.error} headingLevel="h4" onRetry={() => void payments.refetch()} isRetrying={payments.isFetching} />;
  const { payments: list, receivedMinor } = payments.data;
  if (list.length === 0) return <p className="text-graphite-600">No payments yet. Once the client accepts, they can pay the deposit by card from their estimate page.</p>;
  return (
    <div className="space-y-2">
      <ul aria-label="Payments" className="divide-y divide-graphite-200 rounded-lg border border-graphite-300 bg-white">
        {list.map((p) => {
          const summary = paymentSummary(p);
          return (
            <li key={p.id} className="flex flex-wrap justify-between gap-2 px-3 py-2 text-sm">
              <span>
                <strong>{summary.kind}</strong> · <span className={p.status === 'paid' ? 'text-felt' : 'text-graphite-700'}>{summary.status}</span>
                <span className="text-graphite-600"> · {formatDate(p.paidAt ?? p.createdAt)}</span>
              </span>
              <span className="tabular-figures">{formatMinor(p.amountMinor, p.currency)}</span>
            </li>
          );
        })}
      </ul>
      <p className="text-sm font-semibold tabular-figures">Received in all: {formatMinor(receivedMinor, list[0]!.currency)}</p>
    </div>
  );
}
