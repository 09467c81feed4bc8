import type { ReactNode } from 'react';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { Select } from '@/components/select';
import { TextInput } from '@/components/text-input';
import { formatMinor, moneyInputText } from '@/lib/money';
import { LINE_KIND_LABELS, type CataloguePart, type LineDraft, type OptionDraft } from '../lib/estimate-draft';

export interface LineEditorContext {
  currency: string;
  canSeeCosts: boolean;
  tasks: ReadonlyArray<{ id: string; title: string }>;
  parts: readonly CataloguePart[];
  options: readonly OptionDraft[];
  errorFor: (name: string) => string | undefined;
}

interface LineEditorProps extends LineEditorContext {
  line: LineDraft;
  /** The line's place in the whole estimate (1-based), as the API numbers its errors (0-based). */
  number: number;
  amountMinor: number | null;
  onChange: (changes: Partial<LineDraft>) => void;
  onRemove: () => void;
}

const num = 'tabular-figures';

/** One estimate line: what it is, how much of it, at what price, and which option it belongs to. */
export function LineEditor({ line, number, amountMinor, onChange, onRemove, ...ctx }: LineEditorProps) {
  const at = (name: string) => ctx.errorFor(`lines.${number - 1}.${name}`);
  const part = ctx.parts.find((p) => p.id === line.partId);
  const name = line.kind === 'part' ? (part?.name ?? 'no part chosen') : line.description.trim() || 'not described yet';
  const groupLabel = `Line ${number}, ${LINE_KIND_LABELS[line.kind].toLowerCase()}: ${name}`;
  const text = (key: keyof LineDraft) => ({ value: line[key] as string, onChange: (e: { target: { value: string } }) => onChange({ [key]: e.target.value }) });

  let figures: ReactNode;
  if (line.kind === 'labour') {
    figures = (
      <>
        <Field label="Task" error={at('taskId')} className="min-w-48 flex-1">
          {(c) => <Select {...c} isCompact options={[{ value: '', label: 'A new task when accepted' }, ...ctx.tasks.map((t) => ({ value: t.id, label: t.title }))]} {...text('taskId')} />}
        </Field>
        <Field label="Hours" error={at('minutes')} className="w-24">
          {(c) => <TextInput {...c} className={`${num} min-h-9 text-sm`} inputMode="decimal" placeholder="1:30" {...text('hours')} />}
        </Field>
        <Field label="Rate an hour" error={at('unitPriceMinor')} className="w-28">
          {(c) => <TextInput {...c} className={`${num} min-h-9 text-sm`} inputMode="decimal" {...text('unitPrice')} />}
        </Field>
      </>
    );
  } else {
    const unit = line.kind === 'part' ? (part?.unit ?? 'unit') : 'each';
    figures = (
      <>
        <Field label={line.kind === 'part' ? `Quantity (${unit})` : 'Quantity'} error={at('quantityMilli')} className="w-28">
          {(c) => <TextInput {...c} className={`${num} min-h-9 text-sm`} inputMode="decimal" {...text('quantity')} />}
        </Field>
        <Field label={line.kind === 'part' ? 'Price each' : 'Price to the client'} error={at('unitPriceMinor')} className="w-32">
          {(c) => <TextInput {...c} className={`${num} min-h-9 text-sm`} inputMode="decimal" {...text('unitPrice')} />}
        </Field>
        {ctx.canSeeCosts && line.kind !== 'part' && (
          <Field label={line.kind === 'sublet' ? 'Supplier’s cost' : 'Cost each'} error={at('unitCostMinor')} className="w-32">
            {(c) => <TextInput {...c} className={`${num} min-h-9 text-sm`} inputMode="decimal" placeholder="Not known" {...text('unitCost')} />}
          </Field>
        )}
      </>
    );
  }

  return (
    <div role="group" aria-label={groupLabel} className="space-y-2 rounded-md border border-graphite-300 bg-white p-3">
      <div className="flex flex-wrap items-end gap-3">
        <span className="mb-2 rounded-sm bg-graphite-200 px-1.5 text-xs font-semibold text-graphite-700">{LINE_KIND_LABELS[line.kind]}</span>
        {line.kind === 'part' ? (
          <Field label="Part" error={at('partId')} className="min-w-56 flex-1">
            {(c) => (
              <Select
                {...c}
                isCompact
                options={[...(part ? [] : [{ value: '', label: 'Choose a part' }]), ...ctx.parts.map((p) => ({ value: p.id, label: `${p.name} (${p.unit})` }))]}
                value={line.partId}
                onChange={(e) => {
                  const chosen = ctx.parts.find((p) => p.id === e.target.value);
                  onChange({ partId: e.target.value, ...(chosen?.sellPriceMinor !== undefined ? { unitPrice: moneyInputText(chosen.sellPriceMinor, ctx.currency) } : {}) });
                }}
              />
            )}
          </Field>
        ) : (
          <Field label="Description" error={at('description')} className="min-w-56 flex-1">
            {(c) => <TextInput {...c} className="min-h-9 text-sm" {...text('description')} />}
          </Field>
        )}
        {ctx.options.length > 0 && (
          <Field label="Included" error={at('optionKey')} className="w-52">
            {(c) => (
              <Select
                {...c}
                isCompact
                options={[{ value: '', label: 'Always' }, ...ctx.options.map((o) => ({ value: o.key, label: `Only with ${o.name || 'this option'}` }))]}
                value={line.optionKey ?? ''}
                onChange={(e) => onChange({ optionKey: e.target.value || null })}
              />
            )}
          </Field>
        )}
      </div>
      <div className="flex flex-wrap items-end gap-3">
        {figures}
        <p className="ml-auto pb-2 text-right tabular-figures">
          <span className="sr-only">Amount: </span>
          {amountMinor === null ? <span className="text-graphite-600">—</span> : <strong>{formatMinor(amountMinor, ctx.currency)}</strong>}
        </p>
        <Button size="sm" variant="quiet" aria-label={`Remove line ${number}`} onClick={onRemove}>
          Remove
        </Button>
      </div>
    </div>
  );
}
