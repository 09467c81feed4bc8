import { useNavigate } from 'react-router-dom';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { SignUpForm } from '@/features/auth/components/sign-up-form';

export function Component() {
  const navigate = useNavigate();
  return (
    <>
      <title>Set up your workshop · Keybed</title>
      <h1 className="text-xl font-bold">Set up your workshop</h1>
      <p className="mt-1 mb-6 text-graphite-600">
        You become the workshop owner. Invite your foreman and technicians once you are in.
      </p>
      <SignUpForm onCreated={() => void navigate(paths.home.build(), { replace: true })} />
      <p className="mt-6 text-sm text-graphite-600">
        Joining an existing workshop? Ask its owner for an invitation. Already have an account?{' '}
        <TextLink to={paths.signIn.build()}>Sign in</TextLink>
      </p>
    </>
  );
}
