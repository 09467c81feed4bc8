import { useLowStockCount } from '../api/get-parts';

/** The number of parts at or below their reorder level, beside "Parts" in the navigation. */
export function LowStockNavCount() {
  const count = useLowStockCount();
  if (!count.data) return null;
  return (
    <span className="ml-1.5 inline-flex min-w-5 items-center justify-center rounded-full bg-spruce px-1.5 text-xs font-bold text-ink tabular-figures">
      {count.data}
      <span className="sr-only"> {count.data === 1 ? 'part' : 'parts'} low on stock</span>
    </span>
  );
}
