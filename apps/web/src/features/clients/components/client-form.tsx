import type { FormEvent } from 'react';
import { CreateClientInput, UpdateClientInput, type Client } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import { readForm, validateForm } from '@/lib/form';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCreateClient } from '../api/create-client';
import { useUpdateClient } from '../api/update-client';

interface ClientFormProps {
  /** The client to edit; without it the form adds a new client. */
  client?: Client;
  onSaved: (client: Client) => void;
  onCancel?: () => void;
}

/** Name, contact details and notes of a client; adds or edits. */
export function ClientForm({ client, onSaved, onCancel }: ClientFormProps) {
  const create = useCreateClient();
  const update = useUpdateClient();
  const form = useFormErrors();
  const mutation = client ? update : create;

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const values = readForm(event.currentTarget);
    form.reset();
    if (client) {
      const result = validateForm(UpdateClientInput, values);
      if (result.fields) return form.showFields(result.fields);
      update.mutate({ clientId: client.id, changes: result.data }, { onSuccess: onSaved, onError: form.showApiFields });
    } else {
      const result = validateForm(CreateClientInput, values);
      if (result.fields) return form.showFields(result.fields);
      create.mutate(result.data, { onSuccess: onSaved, onError: form.showApiFields });
    }
  }

  return (
    <form
      ref={form.formRef}
      noValidate
      onSubmit={submit}
      onInput={(event) => form.clearField((event.target as HTMLInputElement).name)}
      className="space-y-4"
    >
      <FormError error={mutation.error} except={['validation_failed']} />
      <Field label="Name" error={form.errorFor('name')}>
        {(control) => <TextInput {...control} name="name" defaultValue={client?.name} autoComplete="off" />}
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="E-mail" hint="Optional" error={form.errorFor('email')}>
          {(control) => <TextInput {...control} name="email" type="email" defaultValue={client?.email ?? ''} autoComplete="off" />}
        </Field>
        <Field label="Phone" hint="Optional" error={form.errorFor('phone')}>
          {(control) => <TextInput {...control} name="phone" type="tel" defaultValue={client?.phone ?? ''} autoComplete="off" />}
        </Field>
      </div>
      <Field label="Postal address" hint="Optional" error={form.errorFor('address')}>
        {(control) => <Textarea {...control} name="address" rows={3} defaultValue={client?.address ?? ''} />}
      </Field>
      <Field label="Notes" hint="Optional" error={form.errorFor('notes')}>
        {(control) => <Textarea {...control} name="notes" rows={3} defaultValue={client?.notes ?? ''} />}
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" isPending={mutation.isPending}>
          {client ? 'Save client' : 'Add client'}
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
