import { useState, type FormEvent } from 'react';
import type { Part } from '@keybed/shared';
import { Button } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { currencySymbol } from '@/lib/money';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCreatePart } from '../api/create-part';
import { useUpdatePart } from '../api/update-part';
import { createPartInput, draftFromPart, EMPTY_PART, updatePartInput, type PartDraft } from '../lib/part-form';

interface PartFormProps {
  currency: string;
  /** The part to edit; a new part when left out. */
  part?: Part;
  onSaved: (part: Part) => void;
}

/** A catalogue entry: what it is, where it comes from, what it costs and sells for, when to reorder (owner). */
export function PartForm({ currency, part, onSaved }: PartFormProps) {
  const create = useCreatePart();
  const update = useUpdatePart();
  const mutation = part ? update : create;
  const form = useFormErrors();
  const [draft, setDraft] = useState<PartDraft>(() => (part ? draftFromPart(part, currency) : EMPTY_PART));
  const symbol = currencySymbol(currency);

  const bind = (key: keyof PartDraft, apiName: string) => ({
    value: draft[key] as string,
    onChange: (e: { target: { value: string } }) => {
      setDraft((d) => ({ ...d, [key]: e.target.value }));
      form.clearField(apiName);
    },
  });

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const done = (saved: Part) => {
      showToast('success', part ? `Saved ${saved.name}.` : `Added ${saved.name} to the catalogue.`);
      onSaved(saved);
    };
    if (part) {
      const result = updatePartInput(draft, currency);
      if (result.fields) return form.showFields(result.fields);
      form.reset();
      return update.mutate({ partId: part.id, changes: result.data }, { onSuccess: done, onError: form.showApiFields });
    }
    const result = createPartInput(draft, currency);
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    create.mutate(result.data, { onSuccess: done, onError: form.showApiFields });
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} className="max-w-3xl space-y-4">
      <FormError error={mutation.error} except={['validation_failed', 'conflict']} />
      <div className="grid gap-4 sm:grid-cols-[1fr_12rem]">
        <Field label="Name" hint="e.g. Key bushing cloth" error={form.errorFor('name')}>
          {(control) => <TextInput {...control} autoComplete="off" {...bind('name', 'name')} />}
        </Field>
        <Field label="SKU" hint="Your code for it, unique" error={form.errorFor('sku')}>
          {(control) => <TextInput {...control} autoComplete="off" className="font-mono" {...bind('sku', 'sku')} />}
        </Field>
        <Field label="Supplier" hint="Optional" error={form.errorFor('supplier')}>
          {(control) => <TextInput {...control} {...bind('supplier', 'supplier')} />}
        </Field>
        <Field label="Unit" hint="What one is: set, m, kg, box of 100" error={form.errorFor('unit')}>
          {(control) => <TextInput {...control} {...bind('unit', 'unit')} />}
        </Field>
      </div>
      <fieldset className="space-y-3 rounded-lg border border-graphite-300 bg-white p-4">
        <legend className="px-1 font-semibold">Cost and price of one unit</legend>
        <div className="grid gap-4 sm:grid-cols-3">
          <Field label={`Unit cost (${symbol})`} hint="From the supplier" error={form.errorFor('unitCostMinor')}>
            {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" {...bind('unitCost', 'unitCostMinor')} />}
          </Field>
          <fieldset className="sm:col-span-2">
            <legend className="mb-1 font-semibold">Sell price</legend>
            <div className="flex flex-wrap gap-x-4">
              {(['fixed', 'markup'] as const).map((pricing) => (
                <label key={pricing} className="inline-flex min-h-9 items-center gap-2">
                  <input type="radio" name="pricing" className="size-4 accent-walnut" checked={draft.pricing === pricing} onChange={() => setDraft((d) => ({ ...d, pricing }))} />
                  {pricing === 'fixed' ? 'A fixed price' : 'The cost plus a markup'}
                </label>
              ))}
            </div>
            {draft.pricing === 'fixed' ? (
              <Field label={`Sell price (${symbol})`} error={form.errorFor('sellPriceMinor')} className="mt-1 max-w-48">
                {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" {...bind('sellPrice', 'sellPriceMinor')} />}
              </Field>
            ) : (
              <Field label="Markup on cost (%)" hint="25 % on a cost of 100 sells at 125" error={form.errorFor('markupBasisPoints')} className="mt-1 max-w-48">
                {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" {...bind('markup', 'markupBasisPoints')} />}
              </Field>
            )}
          </fieldset>
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Reorder at" hint="Low stock at or below this; 0 for never" error={form.errorFor('reorderLevelMilli')}>
          {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" {...bind('reorderLevel', 'reorderLevelMilli')} />}
        </Field>
      </div>
      <Checkbox label="In use (offered on estimates and at the wall screen)" checked={draft.isActive} onChange={(e) => setDraft((d) => ({ ...d, isActive: e.target.checked }))} />
      <div>
        <Button type="submit" isPending={mutation.isPending}>
          {part ? 'Save the part' : 'Add the part'}
        </Button>
      </div>
    </form>
  );
}
