import { useSearchParams } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { SearchField } from '@/components/search-field';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useParts } from '../api/get-parts';
import { partFiltersFrom } from '../lib/part-filters';
import { PartsTable } from './parts-table';

/** The catalogue: search, low stock only, and (for the owner) parts no longer in use. */
export function PartsScreen({ currency, canManage }: { currency: string; canManage: boolean }) {
  const [params, setParams] = useSearchParams();
  const filters = partFiltersFrom(params);
  const parts = useParts(filters);
  const setParam = (key: string, value: string | undefined) =>
    setParams(
      (p) => {
        const next = new URLSearchParams(p);
        if (value) next.set(key, value);
        else next.delete(key);
        return next;
      },
      { replace: true },
    );
  const isFiltered = Boolean(filters.q || filters.lowStock);

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-x-6 gap-y-2">
        <SearchField label="Search parts" placeholder="Name, SKU or supplier" value={filters.q ?? ''} onSearch={(text) => setParam('q', text || undefined)} className="w-full max-w-sm" />
        <Checkbox label="Only low stock" checked={filters.lowStock === true} onChange={(e) => setParam('low', e.target.checked ? 'true' : undefined)} />
        {canManage && <Checkbox label="Include parts not in use" checked={filters.include === 'all'} onChange={(e) => setParam('all', e.target.checked ? 'true' : undefined)} />}
      </div>
      {parts.data && (
        <p className="text-sm text-graphite-600" role="status">
          {parts.data.parts.length} {parts.data.parts.length === 1 ? 'part' : 'parts'}
          {parts.data.lowStockCount > 0 && `, ${parts.data.lowStockCount} at or below the reorder level`}
        </p>
      )}
      {parts.isPending ? (
        <LoadingRegion label="Loading parts">
          <Skeleton className="h-72 w-full" />
        </LoadingRegion>
      ) : parts.isError ? (
        <ErrorState error={parts.error} onRetry={() => void parts.refetch()} isRetrying={parts.isFetching} />
      ) : parts.data.parts.length === 0 ? (
        isFiltered ? (
          <EmptyState title="No parts match" action={<ButtonLink to={paths.parts.build()} variant="secondary">Show every part</ButtonLink>}>
            <p>Try another word, or clear the filters.</p>
          </EmptyState>
        ) : (
          <EmptyState title="No parts in the catalogue yet" action={canManage ? <ButtonLink to={paths.newPart.build()}>Add a part</ButtonLink> : undefined}>
            <p>{canManage ? 'Add the felts, wire, pins and sets you keep in stock; then record deliveries as they arrive.' : 'The owner adds the parts the workshop keeps in stock.'}</p>
          </EmptyState>
        )
      ) : (
        <PartsTable parts={parts.data.parts} currency={currency} />
      )}
    </div>
  );
}
