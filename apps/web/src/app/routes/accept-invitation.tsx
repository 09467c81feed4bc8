import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { ErrorState } from '@/components/error-state';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { invitationPreviewQueryOptions, useInvitationPreview } from '@/features/auth/api/get-invitation-preview';
import { AcceptInvitationForm } from '@/features/auth/components/accept-invitation-form';
import { InvitationSummary } from '@/features/auth/components/invitation-summary';
import { isApiError } from '@/lib/api-client';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.token) void queryClient.prefetchQuery(invitationPreviewQueryOptions(params.token));
    return null;
  };

function InvitationUnusable() {
  return (
    <Alert tone="error" title="This invitation link has expired or has already been used.">
      <p>Ask the workshop owner to send you a new invitation.</p>
      <p className="mt-1">
        Joined already? <TextLink to={paths.signIn.build()}>Sign in</TextLink>
      </p>
    </Alert>
  );
}

export function Component() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const preview = useInvitationPreview(token);
  const isUnusable = isApiError(preview.error) && (preview.error.code === 'token_invalid' || preview.error.code === 'not_found');

  return (
    <>
      <title>Join a workshop · Keybed</title>
      <h1 className="text-xl font-bold">{preview.data ? `Join ${preview.data.workshopName}` : 'Join a workshop'}</h1>
      <div className="mt-4 space-y-6">
        {preview.data ? (
          <>
            <InvitationSummary preview={preview.data} />
            <AcceptInvitationForm
              token={token}
              preview={preview.data}
              onJoined={() => void navigate(paths.home.build(), { replace: true })}
            />
          </>
        ) : isUnusable ? (
          <InvitationUnusable />
        ) : preview.isError ? (
          <ErrorState error={preview.error} onRetry={() => void preview.refetch()} isRetrying={preview.isFetching} />
        ) : (
          <LoadingRegion label="Loading your invitation">
            <Skeleton className="h-28 w-full" />
            <Skeleton className="mt-6 h-11 w-full" />
            <Skeleton className="mt-4 h-11 w-full" />
          </LoadingRegion>
        )}
      </div>
    </>
  );
}
