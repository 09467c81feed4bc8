import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { ResetRequestForm } from '@/features/auth/components/reset-request-form';

export function Component() {
  return (
    <>
      <title>Reset your password · Keybed</title>
      <h1 className="text-xl font-bold">Reset your password</h1>
      <p className="mt-1 mb-6 text-graphite-600">We will e-mail you a link to choose a new password.</p>
      <ResetRequestForm />
      <p className="mt-6 text-sm">
        <TextLink to={paths.signIn.build()}>Back to sign in</TextLink>
      </p>
    </>
  );
}
