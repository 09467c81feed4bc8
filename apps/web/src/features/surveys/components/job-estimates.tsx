import type { Estimate } from '@keybed/shared';
import { ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { formatMinor } from '@/lib/money';
import { useJobEstimates } from '../api/get-job-estimates';
import { estimatePdfUrl } from '../api/send-estimate';
import { SendEstimateForm } from './send-estimate-form';

const STATUS: Record<Estimate['status'], string> = { draft: 'Draft', issued: 'Sent, waiting for the client', accepted: 'Accepted', declined: 'Declined', superseded: 'Replaced by a later revision' };

/** The estimates on the job prepared from this survey: see each as a PDF, issue and send it. */
export function JobEstimates({ jobId, clientName }: { jobId: string; clientName: string }) {
  const estimates = useJobEstimates(jobId);
  if (estimates.isPending) return <Skeleton className="h-32 w-full" />;
  if (estimates.isError) return <ErrorState error={estimates.error} headingLevel="h3" onRetry={() => void estimates.refetch()} isRetrying={estimates.isFetching} />;
  const list = [...estimates.data.estimates].reverse();
  return (
    <div className="space-y-3">
      <ButtonLink to={paths.job.build(jobId)} variant="secondary">Open the job and edit its estimate</ButtonLink>
      <ul aria-label="Estimates on the job" className="space-y-3">
        {list.map((estimate) => (
          <li key={estimate.id} className="space-y-3 rounded-lg border border-graphite-300 bg-white p-4">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h3 className="font-semibold">
                Revision {estimate.revision}
                {estimate.title ? `: ${estimate.title}` : ''}
              </h3>
              <span className="text-sm text-graphite-600">
                {STATUS[estimate.status]}
                {estimate.totals ? <span className="tabular-figures"> · {formatMinor(estimate.totals.grossMinor, estimate.currency)} with VAT</span> : null}
              </span>
            </div>
            <a href={estimatePdfUrl(estimate.id)} target="_blank" rel="noreferrer" className="font-semibold text-walnut underline underline-offset-2">
              See the PDF of revision {estimate.revision}
            </a>
            {(estimate.status === 'draft' || estimate.status === 'issued') && <SendEstimateForm estimate={estimate} clientName={clientName} />}
          </li>
        ))}
      </ul>
    </div>
  );
}
