import { useNavigate, useParams } from 'react-router-dom';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { ResetConfirmForm } from '@/features/auth/components/reset-confirm-form';

export function Component() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  return (
    <>
      <title>Choose a new password · Keybed</title>
      <h1 className="text-xl font-bold">Choose a new password</h1>
      <p className="mt-1 mb-6 text-graphite-600">Once it is set, sign in with it.</p>
      <ResetConfirmForm
        token={token}
        onPasswordSet={() => void navigate(paths.signIn.build({ notice: 'password-set' }), { replace: true })}
      />
      <p className="mt-6 text-sm">
        <TextLink to={paths.signIn.build()}>Back to sign in</TextLink>
      </p>
    </>
  );
}
