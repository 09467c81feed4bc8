import type { QueryClient } from '@tanstack/react-query';
import { Navigate, Outlet, useLocation, useMatches } from 'react-router-dom';
import { ErrorState } from '@/components/error-state';
import { paths } from '@/config/paths';
import { meQueryOptions, useMe } from '@/features/auth/api/get-me';
import { isApiError } from '@/lib/api-client';
import { cx } from '@/lib/cx';
import { AppHeader } from '../layout/app-header';
import { PageSkeleton } from '../layout/page-skeleton';
import { SkipLink } from '../layout/skip-link';
import { LiveUpdates } from '../live/live-updates';

export const clientLoader = (queryClient: QueryClient) => () => {
  void queryClient.prefetchQuery(meQueryOptions());
  return null;
};

/** What a route may say about the layout through its `handle`. */
export interface LayoutHandle {
  /** Use the whole width of the screen (the board), not the reading width. */
  isWide?: boolean;
}

function useIsWide() {
  return useMatches().some((match) => (match.handle as LayoutHandle | undefined)?.isWide === true);
}

/** Everything behind sign-in. Pages render only once the member is known. */
export function Component() {
  const me = useMe();
  const location = useLocation();
  const isWide = useIsWide();

  if (me.data) {
    return (
      <div className="flex min-h-dvh flex-col">
        <SkipLink />
        <LiveUpdates />
        <AppHeader me={me.data} isWide={isWide} />
        <main id="main" tabIndex={-1} className={cx('mx-auto w-full flex-1 px-4 py-6 sm:px-6 lg:px-8', isWide ? 'lg:py-6' : 'max-w-7xl lg:py-8')}>
          <Outlet />
        </main>
      </div>
    );
  }
  if (isApiError(me.error) && me.error.code === 'unauthenticated') {
    return <Navigate to={paths.signIn.build({ next: `${location.pathname}${location.search}` })} replace />;
  }
  if (me.isError) {
    return (
      <main id="main" className="mx-auto max-w-xl px-4 py-16">
        <h1 className="sr-only">Keybed could not start</h1>
        <ErrorState error={me.error} onRetry={() => void me.refetch()} isRetrying={me.isFetching} />
      </main>
    );
  }
  return <PageSkeleton />;
}
