import { useRef, type FormEvent } from 'react';
import { CreateInvitationInput } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Select } from '@/components/select';
import { TextInput } from '@/components/text-input';
import { isApiError } from '@/lib/api-client';
import { readForm, validateForm } from '@/lib/form';
import { ROLE_OPTIONS } from '@/lib/roles';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCreateInvitation } from '../api/create-invitation';

/** Sends an e-mailed invitation link; the invited person picks their own name and password. */
export function InviteForm() {
  const invite = useCreateInvitation();
  const form = useFormErrors();
  const emailRef = useRef<HTMLInputElement>(null);

  function handleError(error: Error) {
    if (isApiError(error) && error.code === 'conflict') {
      return form.showFields({ email: ['This person is already a member of the workshop.'] });
    }
    form.showApiFields(error);
  }

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const result = validateForm(CreateInvitationInput, readForm(formElement));
    if (result.fields) {
      invite.reset();
      return form.showFields(result.fields);
    }
    form.reset();
    invite.mutate(result.data, {
      onSuccess: (invitation) => {
        showToast('success', `Invitation sent to ${invitation.email}.`);
        if (emailRef.current) emailRef.current.value = '';
        emailRef.current?.focus();
      },
      onError: handleError,
    });
  }

  return (
    <form
      ref={form.formRef}
      noValidate
      onSubmit={handleSubmit}
      onInput={(event) => form.clearField((event.target as HTMLInputElement).name)}
      className="@container space-y-4"
    >
      <FormError error={invite.error} except={['conflict']} />
      {/* Lays out by the space the form gets (a side column on wide screens), not the window. */}
      <div className="grid gap-4 @md:grid-cols-[1fr_auto] @md:items-start @3xl:grid-cols-[1fr_12rem_auto]">
        <Field label="E-mail" error={form.errorFor('email')} className="@md:col-span-2 @3xl:col-span-1">
          {(control) => <TextInput {...control} ref={emailRef} name="email" type="email" autoComplete="off" required />}
        </Field>
        <Field label="Role" error={form.errorFor('role')}>
          {(control) => <Select {...control} name="role" options={ROLE_OPTIONS} defaultValue="technician" />}
        </Field>
        <Button type="submit" isPending={invite.isPending} className="@md:mt-7">
          Send invitation
        </Button>
      </div>
    </form>
  );
}
