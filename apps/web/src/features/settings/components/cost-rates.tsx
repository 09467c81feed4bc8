import { useState, type FormEvent } from 'react';
import { CreateCostRateInput, type CostRate } from '@keybed/shared';
import { Button } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { TextInput } from '@/components/text-input';
import { formatDateTime, formatDay, todayKey } from '@/lib/format';
import { validateForm } from '@/lib/form';
import { formatMinor, parseMoneyInput } from '@/lib/money';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useAddCostRate } from '../api/add-cost-rate';
import { useCostRates } from '../api/get-cost-rates';

export interface CostRatePerson {
  /** The membership id. */
  id: string;
  name: string;
  roleLabel: string;
}

/** Every member's cost rate history, with a form to add a rate from a date (owner only). */
export function CostRates({ people, currency }: { people: readonly CostRatePerson[]; currency: string }) {
  return (
    <div className="space-y-4">
      <p className="max-w-prose text-graphite-700">
        What an hour of each person’s time costs the workshop. A new rate applies to time worked from its start date on;
        hours already worked keep the rate they were costed at, so past job costs never change.
      </p>
      <ul className="grid gap-4 lg:grid-cols-2">
        {people.map((person) => (
          <li key={person.id}>
            <PersonRates person={person} currency={currency} />
          </li>
        ))}
      </ul>
    </div>
  );
}

function PersonRates({ person, currency }: { person: CostRatePerson; currency: string }) {
  const rates = useCostRates(person.id);
  const headingId = `rates-${person.id}`;
  return (
    <section aria-labelledby={headingId} className="space-y-3 rounded-lg border border-graphite-300 bg-white p-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={headingId} className="font-semibold">
          {person.name} <span className="font-normal text-graphite-600">· {person.roleLabel}</span>
        </h3>
        {rates.data && (
          <p className="text-sm tabular-figures">
            {rates.data.currentRateMinorPerHour === null ? 'No rate in force today' : `${formatMinor(rates.data.currentRateMinorPerHour, currency)} an hour today`}
          </p>
        )}
      </div>
      {rates.isPending ? (
        <LoadingRegion label={`Loading ${person.name}'s cost rates`}>
          <Skeleton className="h-16 w-full" />
        </LoadingRegion>
      ) : rates.isError ? (
        <ErrorState error={rates.error} headingLevel="h4" onRetry={() => void rates.refetch()} isRetrying={rates.isFetching} />
      ) : (
        <RateList rates={rates.data.rates} currency={currency} name={person.name} />
      )}
      <AddRateForm membershipId={person.id} name={person.name} currency={currency} />
    </section>
  );
}

function RateList({ rates, currency, name }: { rates: CostRate[]; currency: string; name: string }) {
  if (rates.length === 0) return <p className="text-sm text-graphite-600">No cost rate yet: {name}’s hours cost nothing in job costs until one is added.</p>;
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">{name}’s cost rates, newest first</caption>
      <thead>
        <tr className="border-b border-graphite-300 text-left">
          <th scope="col" className="py-1 font-semibold">From</th>
          <th scope="col" className="py-1 text-right font-semibold">An hour</th>
          <th scope="col" className="py-1 pl-4 font-semibold">Added</th>
        </tr>
      </thead>
      <tbody>
        {rates.map((rate) => (
          <tr key={rate.id} className="border-b border-graphite-200 last:border-0">
            <td className="py-1 tabular-figures">{formatDay(rate.effectiveFrom)}</td>
            <td className="py-1 text-right tabular-figures">{formatMinor(rate.rateMinorPerHour, currency)}</td>
            <td className="py-1 pl-4 text-graphite-600">
              {rate.createdBy?.name ?? 'Set up with the workshop'} · {formatDateTime(rate.createdAt)}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function AddRateForm({ membershipId, name, currency }: { membershipId: string; name: string; currency: string }) {
  const add = useAddCostRate();
  const form = useFormErrors();
  const [from, setFrom] = useState(todayKey());
  const [rate, setRate] = useState('');

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const amount = parseMoneyInput(rate, currency);
    if (!amount.ok) return form.showFields({ rateMinorPerHour: [amount.message] });
    const result = validateForm(CreateCostRateInput, { effectiveFrom: from, rateMinorPerHour: amount.value });
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    add.mutate(
      { membershipId, input: result.data },
      {
        onSuccess: () => {
          setRate('');
          showToast('success', `New cost rate for ${name} from ${formatDay(result.data.effectiveFrom)}.`);
        },
        onError: form.showApiFields,
      },
    );
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} aria-label={`New cost rate for ${name}`} className="space-y-2 border-t border-graphite-200 pt-3">
      <FormError error={add.error} except={['validation_failed', 'conflict']} />
      <div className="flex flex-wrap items-start gap-3">
        <Field label="From" error={form.errorFor('effectiveFrom')} className="w-44">
          {(control) => <TextInput {...control} type="date" value={from} onChange={(e) => (setFrom(e.target.value), form.clearField('effectiveFrom'))} />}
        </Field>
        <Field label="Cost an hour" error={form.errorFor('rateMinorPerHour')} className="w-36">
          {(control) => (
            <TextInput {...control} inputMode="decimal" className="tabular-figures" value={rate} onChange={(e) => (setRate(e.target.value), form.clearField('rateMinorPerHour'))} />
          )}
        </Field>
        <Button type="submit" variant="secondary" className="mt-7" isPending={add.isPending}>
          Add rate for {name.split(' ')[0]}
        </Button>
      </div>
    </form>
  );
}
