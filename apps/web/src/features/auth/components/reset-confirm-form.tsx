import { PasswordResetConfirmInput } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';

interface ResetConfirmFormProps {
  token: string;
  onPasswordSet: () => void;
}

export function ResetConfirmForm({ token, onPasswordSet }: ResetConfirmFormProps) {
  const confirm = useConfirmPasswordReset();
  const form = useSchemaForm(PasswordResetConfirmInput, confirm, { extra: () => ({ token }), onSuccess: onPasswordSet });
  const isLinkBad =
    (isApiError(confirm.error) && confirm.error.code === 'token_invalid') || form.fields.token !== undefined;


  return (
    <form
      {...form.formProps}
      className="space-y-4"
    >
      {isLinkBad ? (
        <Alert tone="error" title="This reset link has expired or has already been used.">
          <p>
            Links work once and for a limited time. <TextLink to={paths.resetPassword.build()}>Ask for a new link</TextLink>.
          </p>
        </Alert>
      ) : (
        <FormError error={confirm.error} />
      )}
      <Field label="New password" hint="At least 8 characters." error={form.errorFor('password')}>
        {(control) => <TextInput {...control} name="password" type="password" autoComplete="new-password" required />}
      </Field>
      <Button type="submit" isPending={confirm.isPending} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
