import { useState, type FormEvent } from 'react';
import { CreateStageInput } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { validateForm } from '@/lib/form';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCreateStage } from '../api/create-stage';
import { readWipLimit } from '../lib/wip-limit-text';

/** Adds a stage at the end of the board. */
export function AddStageForm() {
  const create = useCreateStage();
  const form = useFormErrors();
  const [name, setName] = useState('');
  const [wipText, setWipText] = useState('');

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const wip = readWipLimit(wipText);
    if (!wip.ok) return form.showFields({ wipLimit: [wip.message] });
    const result = validateForm(CreateStageInput, { name, wipLimit: wip.value });
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    create.mutate(result.data, {
      onSuccess: (stage) => {
        showToast('success', `${stage.name} is added at the end of the board.`);
        setName('');
        setWipText('');
      },
      onError: form.showApiFields,
    });
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} className="space-y-3">
      <FormError error={create.error} except={['validation_failed']} />
      <div className="grid gap-3 sm:grid-cols-[1fr_10rem_auto] sm:items-start">
        <Field label="Stage name" error={form.errorFor('name')}>
          {(control) => <TextInput {...control} value={name} onChange={(e) => { setName(e.target.value); form.clearField('name'); }} />}
        </Field>
        <Field label="WIP limit (optional)" error={form.errorFor('wipLimit')}>
          {(control) => (
            <TextInput {...control} inputMode="numeric" placeholder="None" value={wipText} onChange={(e) => { setWipText(e.target.value); form.clearField('wipLimit'); }} />
          )}
        </Field>
        <Button type="submit" isPending={create.isPending} className="sm:mt-7">
          Add stage
        </Button>
      </div>
    </form>
  );
}
