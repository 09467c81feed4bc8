import { useState, type FormEvent } from 'react';
import { CreateJobInput, type Job } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Select } from '@/components/select';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import { readForm, validateForm } from '@/lib/form';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCreateJob } from '../api/create-job';
import { PRIORITY_OPTIONS } from '../lib/job-labels';

interface NewJobFormProps {
  pianoId: string;
  /** The active stages, in board order; the first is the default. */
  stages: ReadonlyArray<{ id: string; name: string }>;
  defaultStageId?: string | undefined;
  onCreated: (job: Job) => void;
}

/** Title, stage, promised date, priority and first notes of a job on a chosen piano. */
export function NewJobForm({ pianoId, stages, defaultStageId, onCreated }: NewJobFormProps) {
  const create = useCreateJob();
  const form = useFormErrors();
  const [stageId] = useState(() => (stages.some((s) => s.id === defaultStageId) ? defaultStageId : stages[0]?.id));

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const values = readForm(event.currentTarget);
    const result = validateForm(CreateJobInput, { ...values, pianoId, promisedOn: values.promisedOn || null });
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    create.mutate(result.data, { onSuccess: onCreated, onError: form.showApiFields });
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} onInput={(e) => form.clearField((e.target as HTMLInputElement).name)} className="space-y-4">
      <FormError error={create.error} except={['validation_failed']} />
      <Field label="Job title" hint="What the job is, e.g. New hammers, rebush and regulation" error={form.errorFor('title')}>
        {(control) => <TextInput {...control} name="title" autoComplete="off" />}
      </Field>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Stage" error={form.errorFor('stageId')}>
          {(control) => <Select {...control} name="stageId" options={stages.map((s) => ({ value: s.id, label: s.name }))} defaultValue={stageId} />}
        </Field>
        <Field label="Promised date" error={form.errorFor('promisedOn')}>
          {(control) => <TextInput {...control} name="promisedOn" type="date" />}
        </Field>
        <Field label="Priority" error={form.errorFor('priority')}>
          {(control) => <Select {...control} name="priority" options={PRIORITY_OPTIONS} defaultValue="normal" />}
        </Field>
      </div>
      <Field label="Notes" hint="Optional" error={form.errorFor('notes')}>
        {(control) => <Textarea {...control} name="notes" rows={3} />}
      </Field>
      <Button type="submit" isPending={create.isPending}>
        Start job
      </Button>
    </form>
  );
}
