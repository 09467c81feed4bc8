import type { Part } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { Select } from '@/components/select';
import { TextInput } from '@/components/text-input';
import { blankLineDraft, type LineDraft } from '../lib/operation-form';

interface CatalogueLinesEditorProps {
  lines: LineDraft[];
  parts: readonly Part[];
  canSeeCosts: boolean;
  errorFor: (field: string) => string | undefined;
  onChange: (lines: LineDraft[]) => void;
}

const TITLES: Record<LineDraft['kind'], string> = { labour: 'Task', part: 'Part', sublet: 'Sent out' };

/** The operation's default lines: tasks with hours, parts with quantities, work sent out with its price. */
export function CatalogueLinesEditor({ lines, parts, canSeeCosts, errorFor, onChange }: CatalogueLinesEditorProps) {
  const set = (n: number, changes: Partial<LineDraft>) => onChange(lines.map((l, i) => (i === n ? { ...l, ...changes } : l)));
  const quantityField = (n: number, line: LineDraft, at: (name: string) => string | undefined) => (
    <Field label="Quantity" error={at('quantityMilli')}>
      {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={line.quantityText} onChange={(e) => set(n, { quantityText: e.target.value })} />}
    </Field>
  );
  const partOptions = [{ value: '', label: 'Choose a part' }, ...parts.map((p) => ({ value: p.id, label: `${p.name} (${p.unit})` }))];
  return (
    <div className="space-y-3">
      {errorFor('lines') && <p className="font-semibold text-damper">{errorFor('lines')}</p>}
      <ol className="space-y-3">
        {lines.map((line, n) => {
          const at = (name: string) => errorFor(`lines.${n}.${name}`);
          return (
            <li key={n}>
              <fieldset className="grid gap-3 rounded-md border border-graphite-300 bg-graphite-100 p-3 sm:grid-cols-2 lg:grid-cols-4">
                <legend className="px-1 font-semibold">{TITLES[line.kind]} {n + 1}</legend>
                {line.kind === 'part' ? (
                  <Field label="Part" error={at('partId')} className="lg:col-span-2">
                    {(control) => <Select {...control} value={line.partId} options={partOptions} onChange={(e) => set(n, { partId: e.target.value })} />}
                  </Field>
                ) : (
                  <Field label={line.kind === 'labour' ? 'Task' : 'Description'} error={at('description')} className="lg:col-span-2">
                    {(control) => <TextInput {...control} value={line.description} onChange={(e) => set(n, { description: e.target.value })} />}
                  </Field>
                )}
                {line.kind === 'labour' && (
                  <Field label="Hours" hint="1:30 or 1.5" error={at('minutes')}>
                    {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={line.hoursText} onChange={(e) => set(n, { hoursText: e.target.value })} />}
                  </Field>
                )}
                {line.kind === 'part' && quantityField(n, line, at)}
                {line.kind === 'sublet' && (
                  <>
                    <Field label="Supplier" error={at('supplier')}>
                      {(control) => <TextInput {...control} value={line.supplier} onChange={(e) => set(n, { supplier: e.target.value })} />}
                    </Field>
                    {quantityField(n, line, at)}
                    <Field label="Price to the client, each" error={at('unitPriceMinor')}>
                      {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={line.priceText} onChange={(e) => set(n, { priceText: e.target.value })} />}
                    </Field>
                    {canSeeCosts && (
                      <Field label="Expected cost, each (optional)" error={at('unitCostMinor')}>
                        {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={line.costText} onChange={(e) => set(n, { costText: e.target.value })} />}
                      </Field>
                    )}
                  </>
                )}
                <div className="flex items-end">
                  <Button size="sm" variant="quiet" onClick={() => onChange(lines.filter((_, i) => i !== n))}>
                    Remove {TITLES[line.kind].toLowerCase()} {n + 1}
                  </Button>
                </div>
              </fieldset>
            </li>
          );
        })}
      </ol>
      <div className="flex flex-wrap gap-2">
        <Button size="sm" variant="secondary" onClick={() => onChange([...lines, blankLineDraft('labour')])}>Add a task</Button>
        <Button size="sm" variant="secondary" onClick={() => onChange([...lines, blankLineDraft('part')])}>Add a part</Button>
        <Button size="sm" variant="secondary" onClick={() => onChange([...lines, blankLineDraft('sublet')])}>Add work sent out</Button>
      </div>
    </div>
  );
}
