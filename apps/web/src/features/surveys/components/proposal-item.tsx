import { formatHoursMinutes, type CatalogueOperation, type EstimateOptionInput } from '@keybed/shared';
import { Button } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { Field } from '@/components/field';
import { Select } from '@/components/select';
import { formatMinor } from '@/lib/money';
import { draftLineOf, type DraftItem } from '../lib/estimate-proposal';
import { ItemLinesEditor } from './item-lines-editor';

interface ProposalItemProps {
  item: DraftItem;
  operation: CatalogueOperation | undefined;
  options: readonly EstimateOptionInput[];
  currency: string;
  /** Other components this operation also remedies, named. */
  alsoFor: string[];
  errorFor: (field: string) => string | undefined;
  onChange: (item: DraftItem) => void;
  onRemove?: () => void;
}

/** One piece of work: tick it, put it in an option, and edit its lines if the catalogue's do not fit. */
export function ProposalItem({ item, operation, options, currency, alsoFor, errorFor, onChange, onRemove }: ProposalItemProps) {
  const set = (changes: Partial<DraftItem>) => onChange({ ...item, ...changes });
  const isAdded = item.operationId === null;
  return (
    <li className="space-y-2 rounded-md border border-graphite-200 bg-white p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        {isAdded ? (
          <p className="font-semibold">{item.name}</p>
        ) : (
          <Checkbox label={item.name} checked={item.isTicked} onChange={(e) => set({ isTicked: e.target.checked })} />
        )}
        {operation && (
          <span className="text-sm text-graphite-600 tabular-figures">
            {formatHoursMinutes(operation.labourMinutes)} h
            {operation.netMinor !== undefined ? ` · ${formatMinor(operation.netMinor, currency)} ex VAT` : ''}
          </span>
        )}
      </div>
      {alsoFor.length > 0 && <p className="text-sm text-graphite-600">Also for {alsoFor.join(', ')}</p>}
      {item.isTicked && (
        <div className="flex flex-wrap items-end gap-3">
          {options.length > 0 && (
            <Field label={`Option for ${item.name}`} className="min-w-64">
              {(control) => (
                <Select
                  {...control}
                  isCompact
                  value={item.optionKey}
                  options={[{ value: '', label: 'Always included' }, ...options.map((o) => ({ value: o.key, label: `${o.choice}: ${o.name}` }))]}
                  onChange={(e) => set({ optionKey: e.target.value })}
                />
              )}
            </Field>
          )}
          {!isAdded && (
            <Button size="sm" variant="secondary" aria-expanded={item.lines !== null} onClick={() => set({ lines: item.lines ? null : (operation?.lines ?? []).map((l) => draftLineOf(l, currency)) })}>
              {item.lines ? 'Use the catalogue’s lines' : 'Edit lines'}
              <span className="sr-only"> of {item.name}</span>
            </Button>
          )}
          {onRemove && (
            <Button size="sm" variant="quiet" onClick={onRemove}>
              Remove<span className="sr-only"> {item.name}</span>
            </Button>
          )}
        </div>
      )}
      {item.isTicked && item.lines && (
        <ItemLinesEditor itemName={item.name} lines={item.lines} errorFor={(n, field) => errorFor(`lines.${n}.${field}`)} onChange={(lines) => set({ lines })} />
      )}
    </li>
  );
}
