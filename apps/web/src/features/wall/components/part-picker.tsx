import { useId, useState } from 'react';
import type { WallPart } from '@keybed/shared';
import { controlClasses } from '@/components/text-input';
import { describeError } from '@/lib/error-messages';
import { cx } from '@/lib/cx';
import { useWallParts } from '../api/get-wall-parts';
import { quantityText } from '../lib/part-quantity';
import { matchParts } from '../lib/wall-parts';

interface PartPickerProps {
  isBusy: boolean;
  onPick: (part: WallPart) => void;
}

/** One part to pick: named by its name alone; its unit, what is on hand and low stock read as its description. */
function PartButton({ part, isBusy, onPick }: { part: WallPart; isBusy: boolean; onPick: () => void }) {
  const id = useId();
  return (
    <button
      type="button"
      onClick={onPick}
      disabled={isBusy}
      aria-labelledby={`${id}-name`}
      aria-describedby={`${id}-detail`}
      className="flex h-full min-h-20 w-full flex-col items-start justify-center gap-1 rounded-xl border-2 border-graphite-400 bg-white px-5 py-3 text-left shadow-sm active:bg-graphite-200 disabled:opacity-60"
    >
      <span id={`${id}-name`} className="text-wall-sm font-semibold">
        {part.name}
      </span>
      <span id={`${id}-detail`} className="flex flex-wrap items-center gap-x-3 text-xl text-graphite-700">
        <span>Unit: {part.unit}</span>
        <span className="tabular-figures">{part.onHandMilli > 0 ? `${quantityText(part.onHandMilli, part.unit)} on hand` : 'None on hand'}</span>
        {part.isLowStock && <span className="rounded bg-damper px-2 font-semibold text-white">Low stock</span>}
      </span>
    </button>
  );
}

/** The workshop's active parts, searchable, each a large button. */
export function PartPicker({ isBusy, onPick }: PartPickerProps) {
  const parts = useWallParts();
  const [query, setQuery] = useState('');
  if (parts.isPending) return <p role="status" className="text-wall-sm">Loading parts…</p>;
  if (parts.isError) {
    return (
      <div role="alert" className="space-y-4">
        <p className="text-wall-sm">{describeError(parts.error).title}</p>
        <button type="button" onClick={() => void parts.refetch()} className="min-h-16 rounded-xl border-2 border-graphite-400 bg-white px-8 text-wall-sm font-semibold active:bg-graphite-200">
          Try again
        </button>
      </div>
    );
  }
  if (parts.data.length === 0) return <p className="text-wall-sm">The parts catalogue is empty. The owner adds parts in Keybed first.</p>;
  const shown = matchParts(parts.data, query);
  return (
    <div className="space-y-4">
      <label className="block text-xl font-semibold">
        Find a part
        <input
          type="search"
          value={query}
          onChange={(e) => setQuery(e.target.value)}
          placeholder="Name or SKU"
          className={cx(controlClasses, 'mt-1 min-h-16 border-2 text-wall-sm')}
        />
      </label>
      {shown.length > 0 ? (
        <ul aria-label="Parts" className="grid gap-3 xl:grid-cols-2">
          {shown.map((part) => (
            <li key={part.id}>
              <PartButton part={part} isBusy={isBusy} onPick={() => onPick(part)} />
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-xl text-graphite-700">No part matches “{query}”.</p>
      )}
    </div>
  );
}
