import { SignInInput } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const form = useSchemaForm(SignInInput, signIn, { onSuccess: onSignedIn });

  return (
    <form
      {...form.formProps}
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
