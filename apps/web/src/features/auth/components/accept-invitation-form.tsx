import { AcceptInvitationInput, type InvitationPreview } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useAcceptInvitation } from '../api/accept-invitation';

interface AcceptInvitationFormProps {
  token: string;
  preview: InvitationPreview;
  onJoined: () => void;
}

export function AcceptInvitationForm({ token, preview, onJoined }: AcceptInvitationFormProps) {
  const accept = useAcceptInvitation();
  const form = useSchemaForm(AcceptInvitationInput, accept, { extra: () => ({ token }), onSuccess: onJoined });
  const code = isApiError(accept.error) ? accept.error.code : undefined;


  return (
    <form
      {...form.formProps}
      className="space-y-4"
    >
      <FormError error={accept.error}>
        {(code === 'email_taken' || code === 'token_invalid') && (
          <p className="mt-1">
            <TextLink to={paths.signIn.build()}>Go to sign in</TextLink>
          </p>
        )}
      </FormError>
      {/* Lets password managers save the new password against the invited e-mail. */}
      <input type="email" name="username" value={preview.email} autoComplete="username" readOnly hidden />
      <Field label="Your name" hint="How the rest of the workshop will see you." error={form.errorFor('name')}>
        {(control) => <TextInput {...control} name="name" autoComplete="name" required />}
      </Field>
      <Field label="Choose a password" hint="At least 8 characters." error={form.errorFor('password')}>
        {(control) => <TextInput {...control} name="password" type="password" autoComplete="new-password" required />}
      </Field>
      <Button type="submit" isPending={accept.isPending} className="w-full">
        Join workshop
      </Button>
    </form>
  );
}
