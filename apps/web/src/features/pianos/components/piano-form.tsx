import { useState, type FormEvent } from 'react';
import { CreatePianoInput, UpdatePianoInput, formatLengthMm, type KeytopMaterial, type Piano } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { IvoryCaution } from '@/components/ivory-caution';
import { Select } from '@/components/select';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import { readForm, validateForm } from '@/lib/form';
import { useLengthUnit } from '@/lib/length-unit';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCreatePiano } from '../api/create-piano';
import { useUpdatePiano } from '../api/update-piano';
import { KEYTOP_OPTIONS, PIANO_TYPE_OPTIONS, toPianoFields } from '../lib/piano-form-values';
import { SizeField } from './size-field';

interface PianoFormProps {
  /** Owner of a new piano; ignored when editing. */
  clientId: string;
  piano?: Piano;
  onSaved: (piano: Piano) => void;
  onCancel?: () => void;
}

/** Maker, model, serial, type, size, year, case finish, keytops and notes of one piano. */
export function PianoForm({ clientId, piano, onSaved, onCancel }: PianoFormProps) {
  const unit = useLengthUnit();
  const create = useCreatePiano();
  const update = useUpdatePiano();
  const form = useFormErrors();
  const mutation = piano ? update : create;
  const [keytop, setKeytop] = useState<KeytopMaterial>(piano?.keytopMaterial ?? 'unknown');
  const [initialSize] = useState(() => (piano?.sizeMm ? formatLengthMm(piano.sizeMm, unit) : ''));

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const { input, fields } = toPianoFields(readForm(event.currentTarget), unit, initialSize);
    const result = piano ? validateForm(UpdatePianoInput, input) : validateForm(CreatePianoInput, { ...input, clientId });
    const allFields = { ...(result.fields ?? {}), ...fields };
    if (Object.keys(allFields).length > 0) return form.showFields(allFields);
    form.reset();
    if (piano) update.mutate({ pianoId: piano.id, changes: result.data as UpdatePianoInput }, { onSuccess: onSaved, onError: form.showApiFields });
    else create.mutate(result.data as CreatePianoInput, { onSuccess: onSaved, onError: form.showApiFields });
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} onInput={(e) => form.clearField((e.target as HTMLInputElement).name)} className="space-y-4">
      <FormError error={mutation.error} except={['validation_failed']} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Maker" error={form.errorFor('maker')}>
          {(control) => <TextInput {...control} name="maker" defaultValue={piano?.maker} autoComplete="off" />}
        </Field>
        <Field label="Model" hint="Optional" error={form.errorFor('model')}>
          {(control) => <TextInput {...control} name="model" defaultValue={piano?.model} autoComplete="off" />}
        </Field>
        <Field label="Type" error={form.errorFor('type')}>
          {(control) => <Select {...control} name="type" options={PIANO_TYPE_OPTIONS} defaultValue={piano?.type ?? 'grand'} />}
        </Field>
        <SizeField defaultValue={initialSize} unit={unit} error={form.errorFor('sizeMm')} />
        <Field label="Serial number" hint="Optional" error={form.errorFor('serialNumber')}>
          {(control) => <TextInput {...control} name="serialNumber" defaultValue={piano?.serialNumber} autoComplete="off" />}
        </Field>
        <Field label="Year, roughly" hint="Optional, e.g. 1911" error={form.errorFor('yearApprox')}>
          {(control) => <TextInput {...control} name="yearApprox" inputMode="numeric" defaultValue={piano?.yearApprox ?? ''} autoComplete="off" />}
        </Field>
        <Field label="Case finish" hint="Optional" error={form.errorFor('caseFinish')}>
          {(control) => <TextInput {...control} name="caseFinish" defaultValue={piano?.caseFinish} autoComplete="off" />}
        </Field>
        <Field label="Keytops" error={form.errorFor('keytopMaterial')}>
          {(control) => (
            <Select {...control} name="keytopMaterial" options={KEYTOP_OPTIONS} value={keytop} onChange={(e) => setKeytop(e.target.value as KeytopMaterial)} />
          )}
        </Field>
      </div>
      {keytop === 'ivory' && <IvoryCaution />}
      <Field label="Notes" hint="Optional" error={form.errorFor('notes')}>
        {(control) => <Textarea {...control} name="notes" rows={3} defaultValue={piano?.notes} />}
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" isPending={mutation.isPending}>
          {piano ? 'Save piano' : 'Add piano'}
        </Button>
        {onCancel && (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
