import type { FormEvent } from 'react';
import { SignInInput } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { readForm, validateForm } from '@/lib/form';
import { useFormErrors } from '@/lib/use-form-errors';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const form = useFormErrors();

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const result = validateForm(SignInInput, readForm(event.currentTarget));
    if (result.fields) {
      signIn.reset();
      return form.showFields(result.fields);
    }
    form.reset();
    signIn.mutate(result.data, { onSuccess: onSignedIn, onError: form.showApiFields });
  }

  return (
    <form
      ref={form.formRef}
      noValidate
      onSubmit={handleSubmit}
      onInput={(event) => form.clearField((event.target as HTMLInputElement).name)}
      className="space-y-4"
    >
      <FormError error={signIn.error} />
      <Field label="E-mail" error={form.errorFor('email')}>
        {(control) => <TextInput {...control} name="email" type="email" autoComplete="email" required />}
      </Field>
      <Field label="Password" error={form.errorFor('password')}>
        {(control) => (
          <TextInput {...control} name="password" type="password" autoComplete="current-password" required />
        )}
      </Field>
      <Button type="submit" isPending={signIn.isPending} className="w-full">
        Sign in
      </Button>
    </form>
  );
}
