import { useNavigate, useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { TextLink } from '@/components/text-link';
import { paths, safeNextPath, type SignInNotice } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';

const NOTICES: Record<SignInNotice, string> = {
  'password-set': 'Your new password is set. Sign in with it now.',
  'signed-out': 'You are signed out.',
  'invitation-used': 'That invitation has already been accepted. Sign in to carry on.',
};

const isNotice = (value: string | null): value is SignInNotice => value !== null && value in NOTICES;

export function Component() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const notice = searchParams.get('notice');
  const next = safeNextPath(searchParams.get('next'));

  return (
    <>
      <title>Sign in · Keybed</title>
      <h1 className="text-xl font-bold">Sign in</h1>
      <p className="mt-1 mb-6 text-graphite-600">Sign in to your workshop.</p>
      {isNotice(notice) && (
        <Alert tone={notice === 'signed-out' ? 'info' : 'success'} className="mb-4">
          {NOTICES[notice]}
        </Alert>
      )}
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
      <div className="mt-6 space-y-2 text-sm">
        <p>
          <TextLink to={paths.resetPassword.build()}>Forgotten your password?</TextLink>
        </p>
        <p className="text-graphite-600">
          New to Keybed? <TextLink to={paths.signUp.build()}>Set up your workshop</TextLink>
        </p>
      </div>
    </>
  );
}
