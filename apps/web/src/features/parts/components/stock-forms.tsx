import { useState, type FormEvent } from 'react';
import { parseQuantityMilli, type Part } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { formatMinor, moneyInputText, parseMoneyInput, parseQuantityInput } from '@/lib/money';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useRecordMovement } from '../api/record-movement';
import { quantityWithUnit } from '../lib/part-form';

const box = 'space-y-3 rounded-lg border border-graphite-300 bg-white p-4';

/** A delivery into stock, at the cost on the supplier's note (the owner sees and may change it). */
export function ReceiveStockForm({ part, currency }: { part: Part; currency: string }) {
  const record = useRecordMovement();
  const form = useFormErrors();
  const canCost = part.unitCostMinor !== undefined;
  const [quantity, setQuantity] = useState('');
  const [cost, setCost] = useState(canCost ? moneyInputText(part.unitCostMinor!, currency) : '');

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const q = parseQuantityInput(quantity);
    const c = canCost ? parseMoneyInput(cost, currency) : undefined;
    const fields = { ...(q.ok ? {} : { quantityMilli: [q.message] }), ...(c && !c.ok ? { unitCostMinor: [c.message] } : {}) };
    if (!q.ok || (c && !c.ok)) return form.showFields(fields);
    form.reset();
    const input = { kind: 'received' as const, quantityMilli: q.value, ...(c?.ok ? { unitCostMinor: c.value } : {}) };
    record.mutate(
      { partId: part.id, input },
      {
        onSuccess: ({ part: now }) => {
          setQuantity('');
          showToast('success', `Received ${quantityWithUnit(q.value, part.unit)}. On hand now ${quantityWithUnit(now.onHandMilli, part.unit)}.`);
        },
        onError: form.showApiFields,
      },
    );
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} aria-labelledby="receive-heading" className={box}>
      <h3 id="receive-heading" className="font-semibold">Receive a delivery</h3>
      <FormError error={record.error} except={['validation_failed']} />
      <div className="flex flex-wrap items-start gap-3">
        <Field label={`Quantity (${part.unit})`} error={form.errorFor('quantityMilli')} className="w-40">
          {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={quantity} onChange={(e) => (setQuantity(e.target.value), form.clearField('quantityMilli'))} />}
        </Field>
        {canCost && (
          <Field label="Cost each" hint={`Catalogue: ${formatMinor(part.unitCostMinor!, currency)}`} error={form.errorFor('unitCostMinor')} className="w-40">
            {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={cost} onChange={(e) => (setCost(e.target.value), form.clearField('unitCostMinor'))} />}
          </Field>
        )}
      </div>
      <Button type="submit" isPending={record.isPending}>
        Receive into stock
      </Button>
    </form>
  );
}

/** A stock-count correction up or down, always with its reason. */
export function AdjustStockForm({ part }: { part: Part }) {
  const record = useRecordMovement();
  const form = useFormErrors();
  const [quantity, setQuantity] = useState('');
  const [reason, setReason] = useState('');

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const milli = parseQuantityMilli(quantity.trim().replace(',', '.'));
    const fields = {
      ...(milli === null || milli === 0 ? { quantityMilli: ['Write the change, like 2 to add or -1.5 to take away'] } : {}),
      ...(reason.trim().length < 3 ? { reason: ['Say why, in a few words'] } : {}),
    };
    if (Object.keys(fields).length > 0 || milli === null) return form.showFields(fields);
    form.reset();
    record.mutate(
      { partId: part.id, input: { kind: 'adjusted', quantityMilli: milli, reason: reason.trim() } },
      {
        onSuccess: ({ part: now }) => {
          setQuantity('');
          setReason('');
          showToast('success', `Stock adjusted. On hand now ${quantityWithUnit(now.onHandMilli, part.unit)}.`);
        },
        onError: form.showApiFields,
      },
    );
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} aria-labelledby="adjust-heading" className={box}>
      <h3 id="adjust-heading" className="font-semibold">Adjust after a count</h3>
      <FormError error={record.error} except={['validation_failed']} />
      <Field label={`Change (${part.unit})`} hint="Above zero adds to stock, below zero takes away, e.g. -1.5" error={form.errorFor('quantityMilli')} className="w-56">
        {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={quantity} onChange={(e) => (setQuantity(e.target.value), form.clearField('quantityMilli'))} />}
      </Field>
      <Field label="Reason" hint="For example: counted 6.5 m on the shelf" error={form.errorFor('reason')}>
        {(control) => <TextInput {...control} value={reason} onChange={(e) => (setReason(e.target.value), form.clearField('reason'))} />}
      </Field>
      <Button type="submit" variant="secondary" isPending={record.isPending}>
        Record the adjustment
      </Button>
    </form>
  );
}
