import { PasswordResetRequestInput } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useRequestPasswordReset } from '../api/request-password-reset';

/** Asks for a reset link. The answer never says whether the account exists. */
export function ResetRequestForm() {
  const request = useRequestPasswordReset();
  const form = useSchemaForm(PasswordResetRequestInput, request, {});


  if (request.isSuccess) {
    return (
      <div className="space-y-4">
        <Alert tone="success" title="Check your e-mail">
          <p>
            If an account uses <strong className="break-all">{request.variables.email}</strong>, we have sent it a link to
            set a new password. The link works once.
          </p>
        </Alert>
        <p className="text-graphite-600">No e-mail after a few minutes? Check the spam folder, or send another link.</p>
        <Button variant="secondary" onClick={() => request.reset()}>
          Send another link
        </Button>
      </div>
    );
  }

  return (
    <form
      {...form.formProps}
      className="space-y-4"
    >
      <FormError error={request.error} />
      <Field label="E-mail" hint="The one you sign in with." error={form.errorFor('email')}>
        {(control) => <TextInput {...control} name="email" type="email" autoComplete="email" required />}
      </Field>
      <Button type="submit" isPending={request.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
