import { useState } from 'react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { RouterProvider } from 'react-router-dom';
import { ToastRegion } from '@/components/toast-region';
import { isPublicPath, paths } from '@/config/paths';
import { createQueryClient } from '@/lib/query-client';
import { createRouter, type AppRouter } from './router';

function createApp(): { queryClient: QueryClient; router: AppRouter } {
  // The query client needs the router to send signed-out people to sign-in, and the router's
  // loaders need the query client; the callback reads `router` only after both exist.
  let router: AppRouter | undefined;
  const queryClient = createQueryClient({
    onUnauthenticated: () => {
      if (!router) return;
      const location = router.state.navigation.location ?? router.state.location;
      if (isPublicPath(location.pathname)) return;
      void router.navigate(paths.signIn.build({ next: `${location.pathname}${location.search}` }), { replace: true });
    },
  });
  router = createRouter(queryClient);
  return { queryClient, router };
}

export function AppProviders() {
  const [{ queryClient, router }] = useState(createApp);
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
      <ToastRegion />
    </QueryClientProvider>
  );
}
