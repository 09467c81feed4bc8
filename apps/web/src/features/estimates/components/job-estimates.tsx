import type { Estimate, JobEstimates as JobEstimatesData } from '@keybed/shared';
import { formatHoursMinutes } from '@keybed/shared';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { FormError } from '@/components/form-error';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { formatMinor } from '@/lib/money';
import { showToast } from '@/lib/toast';
import { useCreateEstimate } from '../api/create-estimate';
import { useJobEstimates } from '../api/get-job-estimates';
import { arrange, estimateName } from '../lib/estimate-labels';
import type { EstimateEditorProps } from './estimate-editor';
import { EstimateCard } from './estimate-card';

export interface JobEstimatesProps extends Omit<EstimateEditorProps, 'estimate'> {
  jobId: string;
  canEdit: boolean;
  /** The job takes no new estimates (cancelled). */
  isClosed: boolean;
}

function Agreed({ agreed, estimates }: { agreed: JobEstimatesData['agreed']; estimates: Estimate[] }) {
  if (agreed.estimateIds.length === 0) return null;
  const parts = estimates.filter((e) => agreed.estimateIds.includes(e.id));
  const currency = estimates[0]?.currency ?? 'GBP';
  return (
    <p className="rounded-md border border-felt bg-felt-light p-3" role="status">
      <strong>Agreed so far:</strong> {parts.map((e) => estimateName(e)).join(' + ')}
      {agreed.netMinor !== undefined && <span className="tabular-figures"> · {formatMinor(agreed.netMinor, currency)} ex VAT</span>}
      <span className="tabular-figures"> · {formatHoursMinutes(agreed.labourMinutes)} of labour budgeted</span>
    </p>
  );
}

/** A job's estimate: the original with each variation, earlier revisions, and the next step to take. */
export function JobEstimates({ jobId, canEdit, isClosed, ...editor }: JobEstimatesProps) {
  const estimates = useJobEstimates(jobId);
  const create = useCreateEstimate(jobId);
  if (estimates.isPending) {
    return (
      <LoadingRegion label="Loading the estimate">
        <Skeleton className="h-48 w-full" />
      </LoadingRegion>
    );
  }
  if (estimates.isError) return <ErrorState error={estimates.error} headingLevel="h3" onRetry={() => void estimates.refetch()} isRetrying={estimates.isFetching} />;

  const list = estimates.data.estimates;
  const { current, variations, earlier, hasAccepted, hasDraftOriginal, hasDraftVariation } = arrange(list);
  const start = (input: Parameters<typeof create.mutate>[0]['input'], what: string) =>
    create.mutate({ jobId, input }, { onSuccess: (made) => showToast('success', `${estimateName(made)} started as ${what}.`) });
  const card = (e: Estimate) => <EstimateCard key={e.id} estimate={e} canEdit={canEdit} {...editor} />;
  const canStart = canEdit && !isClosed;

  return (
    <div className="space-y-4">
      <FormError error={create.error} />
      <Agreed agreed={estimates.data.agreed} estimates={list} />
      {!current ? (
        <EmptyState title="No estimate yet" headingLevel="h3" action={canStart ? <Button isPending={create.isPending} onClick={() => start({}, 'a draft')}>Start an estimate</Button> : undefined}>
          <p>{canEdit ? 'Price the work line by line: labour against tasks, parts from the catalogue, work sent out, and options for the client to choose between.' : 'The owner or foreman prices the work here.'}</p>
        </EmptyState>
      ) : (
        card(current)
      )}
      {variations.map(card)}
      {canStart && current && (
        <div className="flex flex-wrap gap-2">
          {hasAccepted && !hasDraftVariation && (
            <Button variant="secondary" isPending={create.isPending} onClick={() => start({ kind: 'variation' }, 'a variation')}>
              Add a variation
            </Button>
          )}
          {!hasAccepted && !hasDraftOriginal && (
            <Button variant="secondary" isPending={create.isPending} onClick={() => start({ copyFromId: current.id, title: current.title, notes: current.notes }, `a new revision of ${estimateName(current).toLowerCase()}`)}>
              Start a new revision
            </Button>
          )}
        </div>
      )}
      {earlier.length > 0 && (
        <details className="rounded-lg border border-graphite-300 bg-white p-3">
          <summary className="cursor-pointer font-semibold">Earlier revisions ({earlier.length})</summary>
          <div className="mt-3 space-y-4">{earlier.map(card)}</div>
        </details>
      )}
    </div>
  );
}
