import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { TextInput } from '@/components/text-input';
import { blankLine, type DraftLine } from '../lib/estimate-proposal';

interface ItemLinesEditorProps {
  /** Names the work the lines belong to, for the controls' accessible names. */
  itemName: string;
  lines: DraftLine[];
  /** Field errors keyed "<n>.<field>" within this item. */
  errorFor: (n: number, field: string) => string | undefined;
  onChange: (lines: DraftLine[]) => void;
}

const KIND_LABELS: Record<DraftLine['kind'], string> = { labour: 'Labour', part: 'Part', sublet: 'Sent out', other: 'Other' };

/** The lines of one piece of work, as they will go on the estimate: words, hours, quantities and prices. */
export function ItemLinesEditor({ itemName, lines, errorFor, onChange }: ItemLinesEditorProps) {
  const set = (n: number, changes: Partial<DraftLine>) => onChange(lines.map((l, i) => (i === n ? { ...l, ...changes } : l)));
  return (
    <div className="space-y-3">
      <ol className="space-y-3" aria-label={`Lines of ${itemName}`}>
        {lines.map((line, n) => (
          <li key={n} className="grid items-start gap-2 rounded-md border border-graphite-200 bg-graphite-100 p-2 sm:grid-cols-[5.5rem_1fr_8rem_8rem_auto]">
            <span className="pt-2 text-sm font-semibold text-graphite-700">{KIND_LABELS[line.kind]}</span>
            <Field label={`Line ${n + 1} description`} isLabelHidden error={errorFor(n, 'description')}>
              {(control) => <TextInput {...control} value={line.description} placeholder={line.kind === 'part' ? 'Part' : 'Describe the work'} onChange={(e) => set(n, { description: e.target.value })} />}
            </Field>
            {line.kind === 'labour' ? (
              <Field label={`Line ${n + 1} hours`} isLabelHidden error={errorFor(n, 'hours')}>
                {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" placeholder="h:mm" value={line.hoursText} onChange={(e) => set(n, { hoursText: e.target.value })} />}
              </Field>
            ) : (
              <Field label={`Line ${n + 1} quantity${line.unit ? ` (${line.unit})` : ''}`} isLabelHidden error={errorFor(n, 'quantity')}>
                {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={line.quantityText} onChange={(e) => set(n, { quantityText: e.target.value })} />}
              </Field>
            )}
            {line.kind === 'sublet' || line.kind === 'other' ? (
              <Field label={`Line ${n + 1} price each`} isLabelHidden error={errorFor(n, 'price')}>
                {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" placeholder="Price each" value={line.priceText} onChange={(e) => set(n, { priceText: e.target.value })} />}
              </Field>
            ) : (
              <span className="pt-2 text-sm text-graphite-600">{line.kind === 'labour' ? 'at the hourly rate' : 'at the part’s price'}</span>
            )}
            <Button size="sm" variant="quiet" onClick={() => onChange(lines.filter((_, i) => i !== n))}>
              Remove<span className="sr-only"> line {n + 1} of {itemName}</span>
            </Button>
          </li>
        ))}
      </ol>
      <div className="flex flex-wrap gap-2">
        <Button size="sm" variant="secondary" onClick={() => onChange([...lines, blankLine('labour')])}>
          Add labour<span className="sr-only"> to {itemName}</span>
        </Button>
        <Button size="sm" variant="secondary" onClick={() => onChange([...lines, blankLine('other')])}>
          Add a priced line<span className="sr-only"> to {itemName}</span>
        </Button>
      </div>
    </div>
  );
}
