import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { useJobCosting } from '../api/get-job-costing';
import { CostingSummary } from './costing-summary';
import { JobPartsTable } from './job-parts-table';
import { SubletBills } from './sublet-bills';
import { TaskCostsTable } from './task-costs-table';

/** The job's costing: the same figures per task as the margins page shows per job (money for the owner). */
export function JobCosting({ jobId }: { jobId: string }) {
  const costing = useJobCosting(jobId);
  if (costing.isPending) {
    return (
      <LoadingRegion label="Loading the costing">
        <Skeleton className="h-40 w-full" />
      </LoadingRegion>
    );
  }
  if (costing.isError) return <ErrorState error={costing.error} headingLevel="h3" onRetry={() => void costing.refetch()} isRetrying={costing.isFetching} />;
  const data = costing.data;
  return (
    <div className="space-y-5">
      <CostingSummary costing={data} />
      {data.tasks.length === 0 ? <p className="text-graphite-600">No tasks yet: hours are budgeted and logged per task.</p> : <TaskCostsTable costing={data} />}
      <div className="space-y-2">
        <h3 className="font-semibold">Parts against the budget</h3>
        <JobPartsTable costing={data} />
      </div>
      {data.subletBills && (
        <div className="space-y-2">
          <h3 className="font-semibold">Sublet bills</h3>
          <SubletBills jobId={jobId} bills={data.subletBills} currency={data.currency} />
        </div>
      )}
    </div>
  );
}
