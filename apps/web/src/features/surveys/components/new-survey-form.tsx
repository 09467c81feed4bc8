import { useState } from 'react';
import { CreateSurveyInput, type Survey } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Select } from '@/components/select';
import { TextInput } from '@/components/text-input';
import { todayKey } from '@/lib/format';
import { validateForm } from '@/lib/form';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCreateSurvey } from '../api/create-survey';
import type { Person } from './particulars-section';

interface NewSurveyFormProps {
  pianoId: string;
  people: readonly Person[];
  /** The signed-in member, the assessor unless someone else is chosen. */
  meId: string;
  onStarted: (survey: Survey) => void;
}

/** Starts a survey from the workshop's template for this piano; the piano's particulars are confirmed inside. */
export function NewSurveyForm({ pianoId, people, meId, onStarted }: NewSurveyFormProps) {
  const create = useCreateSurvey();
  const { formRef, errorFor, showFields, showApiFields, clearField } = useFormErrors();
  const [values, setValues] = useState({ surveyedOn: todayKey(), place: '', assessorId: meId });
  const set = (name: keyof typeof values, value: string) => {
    setValues((v) => ({ ...v, [name]: value }));
    clearField(name);
  };
  const assessors = people.some((p) => p.id === meId) ? people : [{ id: meId, name: 'Me' }, ...people];

  return (
    <form
      ref={formRef}
      noValidate
      className="max-w-xl space-y-4"
      onSubmit={(event) => {
        event.preventDefault();
        const result = validateForm(CreateSurveyInput, values);
        if (result.fields) return showFields(result.fields);
        create.mutate({ pianoId, input: result.data }, { onSuccess: onStarted, onError: showApiFields });
      }}
    >
      <FormError error={create.error} except={['validation_failed']} />
      <Field label="Date of the survey" error={errorFor('surveyedOn')}>
        {(control) => <TextInput {...control} type="date" value={values.surveyedOn} onChange={(e) => set('surveyedOn', e.target.value)} />}
      </Field>
      <Field label="Place" hint="The client’s home, or the workshop" error={errorFor('place')}>
        {(control) => <TextInput {...control} value={values.place} onChange={(e) => set('place', e.target.value)} />}
      </Field>
      <Field label="Assessed by" error={errorFor('assessorId')}>
        {(control) => <Select {...control} value={values.assessorId} options={assessors.map((p) => ({ value: p.id, label: p.name }))} onChange={(e) => set('assessorId', e.target.value)} />}
      </Field>
      <Button type="submit" isPending={create.isPending}>Start the survey</Button>
    </form>
  );
}
