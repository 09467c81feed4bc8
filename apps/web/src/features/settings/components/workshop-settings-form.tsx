import { useMemo, useState, type FormEvent } from 'react';
import type { WorkshopSettings } from '@keybed/shared';
import { Button } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Select } from '@/components/select';
import { TextInput } from '@/components/text-input';
import { currencySymbol } from '@/lib/money';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { usePutSettings } from '../api/put-settings';
import { draftFrom, settingsInput, WEEKDAYS, type SettingsDraft } from '../lib/settings-form';
import { currencyOptions, timeZoneOptions } from '../lib/zone-and-currency';

const fieldset = 'space-y-4 rounded-lg border border-graphite-300 bg-white p-4';
const legend = 'px-1 text-lg font-semibold';

/** Currency, tax, the charge-out rate, the target margin, stock, time zone and the working day (owner). */
export function WorkshopSettingsForm({ settings }: { settings: WorkshopSettings }) {
  const put = usePutSettings();
  const form = useFormErrors();
  const [draft, setDraft] = useState(() => draftFrom(settings));
  const currencies = useMemo(() => currencyOptions(settings.currency), [settings.currency]);
  const zones = useMemo(() => timeZoneOptions(settings.timeZone), [settings.timeZone]);

  const change = (changes: Partial<SettingsDraft>) => {
    setDraft((d) => ({ ...d, ...changes }));
    for (const key of Object.keys(changes)) form.clearField(key);
  };
  const text = (name: keyof SettingsDraft, apiName: string = name) => ({
    name: apiName,
    value: draft[name] as string,
    onChange: (e: { target: { value: string } }) => {
      change({ [name]: e.target.value });
      form.clearField(apiName);
    },
  });

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const result = settingsInput(draft);
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    put.mutate(result.data, {
      onSuccess: (saved) => {
        setDraft(draftFrom(saved));
        showToast('success', 'Workshop settings saved.');
      },
      onError: form.showApiFields,
    });
  }

  const symbol = /^[A-Z]{3}$/.test(draft.currency) ? currencySymbol(draft.currency) : '';
  return (
    <form ref={form.formRef} noValidate onSubmit={submit} className="space-y-6">
      <FormError error={put.error} except={['validation_failed']} />
      <fieldset className={fieldset}>
        <legend className={legend}>Money</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Currency" hint="Prices, costs and reports use it. It cannot change once prices are recorded." error={form.errorFor('currency')}>
            {(control) => <Select {...control} name="currency" options={currencies} value={draft.currency} onChange={(e) => change({ currency: e.target.value })} />}
          </Field>
          <Field label="VAT rate (%)" hint="Added once to each estimate's total, e.g. 20" error={form.errorFor('taxRateBasisPoints')}>
            {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" {...text('taxRate', 'taxRateBasisPoints')} />}
          </Field>
          <Field label={`Labour charge-out rate (${symbol || 'per hour'} an hour)`} hint="What an hour of labour costs the client on estimates" error={form.errorFor('labourRateMinorPerHour')}>
            {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" {...text('labourRate', 'labourRateMinorPerHour')} />}
          </Field>
          <Field label="Target margin (%)" hint="Jobs whose forecast margin falls below this are flagged" error={form.errorFor('targetMarginBasisPoints')}>
            {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" {...text('targetMargin', 'targetMarginBasisPoints')} />}
          </Field>
        </div>
        <div>
          <Checkbox label="Allow stock to go below zero" checked={draft.allowNegativeStock} onChange={(e) => change({ allowNegativeStock: e.target.checked })} />
          <p className="text-sm text-graphite-600">Off: a technician cannot log more of a part than is on hand until the delivery is received.</p>
        </div>
      </fieldset>
      <WorkingTimeFields draft={draft} zones={zones} change={change} errorFor={form.errorFor} />
      <Button type="submit" isPending={put.isPending}>
        Save workshop settings
      </Button>
    </form>
  );
}

interface WorkingTimeFieldsProps {
  draft: SettingsDraft;
  zones: ReturnType<typeof timeZoneOptions>;
  change: (changes: Partial<SettingsDraft>) => void;
  errorFor: (name: string) => string | undefined;
}

function WorkingTimeFields({ draft, zones, change, errorFor }: WorkingTimeFieldsProps) {
  const toggleDay = (day: number, isOn: boolean) =>
    change({ workingWeekdays: isOn ? [...draft.workingWeekdays, day].sort((a, b) => a - b) : draft.workingWeekdays.filter((d) => d !== day) });
  return (
    <fieldset className={fieldset}>
      <legend className={legend}>Time</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Time zone" hint="Days, weeks and the bench day follow it" error={errorFor('timeZone')}>
          {(control) => <Select {...control} name="timeZone" options={zones} value={draft.timeZone} onChange={(e) => change({ timeZone: e.target.value })} />}
        </Field>
        <Field label="Bench day closes at" hint="Timers still running then are stopped" error={errorFor('benchDayClose')}>
          {(control) => <TextInput {...control} type="time" name="benchDayClose" value={draft.benchDayClose} onChange={(e) => change({ benchDayClose: e.target.value })} />}
        </Field>
        <Field label="Working day starts" error={errorFor('workingDayStart')}>
          {(control) => <TextInput {...control} type="time" name="workingDayStart" value={draft.workingDayStart} onChange={(e) => change({ workingDayStart: e.target.value })} />}
        </Field>
        <Field label="Working day ends" error={errorFor('workingDayEnd')}>
          {(control) => <TextInput {...control} type="time" name="workingDayEnd" value={draft.workingDayEnd} onChange={(e) => change({ workingDayEnd: e.target.value })} />}
        </Field>
      </div>
      <fieldset aria-describedby={errorFor('workingWeekdays') ? 'weekdays-error' : undefined}>
        <legend className="mb-1 font-semibold">Working days</legend>
        <p className="mb-1 text-sm text-graphite-600">Utilisation counts the hours of these days.</p>
        <div className="flex flex-wrap gap-x-5">
          {WEEKDAYS.map((day) => (
            <Checkbox
              key={day.value}
              label={day.label}
              name="workingWeekdays"
              aria-invalid={errorFor('workingWeekdays') ? true : undefined}
              checked={draft.workingWeekdays.includes(day.value)}
              onChange={(e) => toggleDay(day.value, e.target.checked)}
            />
          ))}
        </div>
        {errorFor('workingWeekdays') && (
          <p id="weekdays-error" className="mt-1 text-sm font-semibold text-damper">
            <span aria-hidden="true">! </span>
            {errorFor('workingWeekdays')}
          </p>
        )}
      </fieldset>
    </fieldset>
  );
}
