import { useState, type FormEvent } from 'react';
import { CreateSubletBillInput, type JobCosting } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { formatDay, todayKey } from '@/lib/format';
import { validateForm } from '@/lib/form';
import { formatMinor, parseMoneyInput } from '@/lib/money';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useAddSubletBill } from '../api/add-sublet-bill';

type Bills = NonNullable<JobCosting['subletBills']>;

/** Suppliers' bills for work sent out, and a form to record one when it arrives (owner). */
export function SubletBills({ jobId, bills, currency }: { jobId: string; bills: Bills; currency: string }) {
  return (
    <div className="space-y-3">
      {bills.length === 0 ? (
        <p className="text-graphite-600">No bills yet. Sublet work is forecast at its estimated cost until its bill arrives.</p>
      ) : (
        <ul className="divide-y divide-graphite-200 rounded-lg border border-graphite-300 bg-white">
          {bills.map((b) => (
            <li key={b.id} className="flex flex-wrap justify-between gap-2 px-3 py-2 text-sm">
              <span>
                <strong>{b.supplier}</strong> · {b.description} <span className="text-graphite-600">· {formatDay(b.receivedOn)}</span>
              </span>
              <span className="tabular-figures">{formatMinor(b.costMinor, currency)}</span>
            </li>
          ))}
        </ul>
      )}
      <AddBillForm jobId={jobId} currency={currency} />
    </div>
  );
}

function AddBillForm({ jobId, currency }: { jobId: string; currency: string }) {
  const add = useAddSubletBill();
  const form = useFormErrors();
  const [values, setValues] = useState({ supplier: '', description: '', cost: '', receivedOn: todayKey() });
  const bind = (key: keyof typeof values, apiName: string = key) => ({
    value: values[key],
    onChange: (e: { target: { value: string } }) => (setValues((v) => ({ ...v, [key]: e.target.value })), form.clearField(apiName)),
  });

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const cost = parseMoneyInput(values.cost, currency);
    const result = validateForm(CreateSubletBillInput, { ...values, costMinor: cost.ok ? cost.value : undefined });
    const fields = { ...(result.fields ?? {}), ...(cost.ok ? {} : { costMinor: [cost.message] }) };
    if (result.fields || !cost.ok) return form.showFields(fields);
    form.reset();
    add.mutate(
      { jobId, input: result.data },
      { onSuccess: (bill) => (setValues((v) => ({ ...v, description: '', cost: '' })), showToast('success', `Recorded ${bill.supplier}’s bill.`)), onError: form.showApiFields },
    );
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} aria-label="Record a supplier’s bill" className="space-y-3 rounded-lg border border-graphite-300 bg-white p-4">
      <h4 className="font-semibold">Record a supplier’s bill</h4>
      <FormError error={add.error} except={['validation_failed']} />
      <div className="grid gap-3 md:grid-cols-[1fr_1.5fr_9rem_10rem]">
        <Field label="Supplier" error={form.errorFor('supplier')}>{(c) => <TextInput {...c} {...bind('supplier')} />}</Field>
        <Field label="What for" error={form.errorFor('description')}>{(c) => <TextInput {...c} {...bind('description')} />}</Field>
        <Field label="Cost ex VAT" error={form.errorFor('costMinor')}>{(c) => <TextInput {...c} inputMode="decimal" className="tabular-figures" {...bind('cost', 'costMinor')} />}</Field>
        <Field label="Received on" error={form.errorFor('receivedOn')}>{(c) => <TextInput {...c} type="date" {...bind('receivedOn')} />}</Field>
      </div>
      <Button type="submit" variant="secondary" isPending={add.isPending}>Record the bill</Button>
    </form>
  );
}
