import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { SelectOption } from '@/components/select';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { formatDay } from '@/lib/format';
import { formatBasisPoints, formatMinor, formatPercent } from '@/lib/money';
import { marginsCsvUrl, useMargins } from '../api/get-margins';
import { marginsFiltersFrom, withMarginsFilters } from '../lib/margins-filters';
import { HoursChart, MarginChart } from './margin-charts';
import { MarginsFiltersForm } from './margins-filters-form';
import { MarginsTable } from './margins-table';
import { UtilisationTable } from './utilisation-table';

function Skeletons() {
  return (
    <LoadingRegion label="Loading the margins">
      <Skeleton className="h-24 w-full" />
      <div className="mt-6 grid gap-4 lg:grid-cols-2">
        <Skeleton className="h-64" />
        <Skeleton className="h-64" />
      </div>
      <Skeleton className="mt-6 h-72 w-full" />
    </LoadingRegion>
  );
}

/** The owner's margins: a period and status from the URL, jobs at risk first, charts, utilisation, CSV. */
export function MarginsScreen({ statusOptions }: { statusOptions: readonly SelectOption[] }) {
  const [params, setParams] = useSearchParams();
  const { filters, problems } = useMemo(() => marginsFiltersFrom(params), [params]);
  const report = useMargins(filters);
  const data = report.data;

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <MarginsFiltersForm filters={filters} period={data} problems={problems} statusOptions={statusOptions} onChange={(changes) => setParams(withMarginsFilters(params, changes), { replace: true })} />
        <a href={marginsCsvUrl(filters)} download className="inline-flex min-h-11 items-center rounded-md border border-graphite-400 bg-white px-4 font-semibold hover:bg-graphite-100">
          Download CSV
        </a>
      </div>
      {report.isPending ? (
        <Skeletons />
      ) : report.isError && !data ? (
        <ErrorState error={report.error} onRetry={() => void report.refetch()} isRetrying={report.isFetching} />
      ) : data ? (
        <div className="space-y-6" aria-busy={report.isFetching || undefined}>
          <section aria-label="Summary" className="grid gap-3 rounded-lg border border-graphite-300 bg-white p-4 sm:grid-cols-2 lg:grid-cols-4">
            <p>
              <span className="block text-sm text-graphite-600">Period</span>
              <span className="tabular-figures">{formatDay(data.from)} to {formatDay(data.to)}</span>
            </p>
            <p>
              <span className="block text-sm text-graphite-600">Agreed price ex VAT</span>
              <span className="text-lg font-semibold tabular-figures">{formatMinor(data.totals.priceMinor, data.currency)}</span>
            </p>
            <p>
              <span className="block text-sm text-graphite-600">Forecast margin</span>
              <span className="text-lg font-semibold tabular-figures">
                {formatMinor(data.totals.forecastMarginMinor, data.currency)} · {formatPercent(data.totals.forecastMarginPercent)}
              </span>
            </p>
            <p>
              <span className="block text-sm text-graphite-600">Jobs at risk (target {formatBasisPoints(data.targetMarginBasisPoints)})</span>
              <span className={`text-lg font-semibold tabular-figures ${data.totals.atRiskCount > 0 ? 'text-damper' : ''}`}>
                {data.totals.atRiskCount} of {data.totals.jobCount}
              </span>
            </p>
          </section>
          {data.rows.length === 0 ? (
            <EmptyState title="No jobs in this period">
              <p>No job was open between these dates{filters.status ? ' with this status' : ''}. Widen the dates or choose any status.</p>
            </EmptyState>
          ) : (
            <>
              <div className="grid gap-4 xl:grid-cols-2">
                <MarginChart report={data} />
                <HoursChart report={data} />
              </div>
              <section aria-labelledby="margins-jobs-heading" className="space-y-2">
                <h2 id="margins-jobs-heading" className="text-lg font-semibold">Jobs</h2>
                <MarginsTable report={data} />
              </section>
            </>
          )}
          <section aria-labelledby="margins-utilisation-heading" className="space-y-2">
            <h2 id="margins-utilisation-heading" className="text-lg font-semibold">Technician utilisation</h2>
            <UtilisationTable utilisation={data.utilisation} />
          </section>
        </div>
      ) : null}
    </div>
  );
}
