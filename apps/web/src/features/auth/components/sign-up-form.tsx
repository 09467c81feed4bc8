import { SignUpInput } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { isApiError } from '@/lib/api-client';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useSignUp } from '../api/sign-up';

export function SignUpForm({ onCreated }: { onCreated: () => void }) {
  const signUp = useSignUp();
  const form = useSchemaForm(SignUpInput, signUp, {
    onSuccess: onCreated,
    onError: (error, fields) => {
      if (isApiError(error) && error.code === 'email_taken') {
        return fields.showFields({ email: ['An account already uses this e-mail. Sign in instead, or use another e-mail.'] });
      }
      fields.showApiFields(error);
    },
  });

  return (
    <form
      {...form.formProps}
      className="space-y-4"
    >
      <FormError error={signUp.error} except={['email_taken']} />
      <Field label="Workshop name" hint="As your clients know it." error={form.errorFor('workshopName')}>
        {(control) => <TextInput {...control} name="workshopName" autoComplete="organization" required />}
      </Field>
      <Field label="Your name" error={form.errorFor('name')}>
        {(control) => <TextInput {...control} name="name" autoComplete="name" required />}
      </Field>
      <Field label="E-mail" error={form.errorFor('email')}>
        {(control) => <TextInput {...control} name="email" type="email" autoComplete="email" required />}
      </Field>
      <Field label="Password" hint="At least 8 characters." error={form.errorFor('password')}>
        {(control) => <TextInput {...control} name="password" type="password" autoComplete="new-password" required />}
      </Field>
      <Button type="submit" isPending={signUp.isPending} className="w-full">
        Create workshop
      </Button>
    </form>
  );
}
