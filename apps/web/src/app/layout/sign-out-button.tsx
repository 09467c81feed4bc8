import { useNavigate } from 'react-router-dom';
import { Spinner } from '@/components/spinner';
import { paths } from '@/config/paths';
import { useSignOut } from '@/features/auth/api/sign-out';

export function SignOutButton() {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <button
      type="button"
      disabled={signOut.isPending}
      onClick={() =>
        signOut.mutate(undefined, {
          onSuccess: () => void navigate(paths.signIn.build({ notice: 'signed-out' }), { replace: true }),
        })
      }
      className="inline-flex min-h-11 items-center gap-2 rounded-md border border-graphite-500 px-3 font-semibold text-paper hover:bg-graphite-700 disabled:opacity-60"
    >
      {signOut.isPending && <Spinner />}
      Sign out
    </button>
  );
}
