import type { ComponentType } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type LoaderFunction, type RouteObject } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageSkeleton } from './layout/page-skeleton';
import { RootLayout } from './layout/root-layout';
import { PageRouteError, RootRouteError } from './routes/route-error';

/** What a lazy route module may export. Loaders only warm the query cache; pages read via useQuery. */
interface RouteModule {
  Component: ComponentType;
  ErrorBoundary?: ComponentType;
  handle?: unknown;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

export function createRouter(queryClient: QueryClient) {
  const lazy = (load: () => Promise<RouteModule>) => async () => {
    const { clientLoader, ...rest } = await load();
    return clientLoader ? { ...rest, loader: clientLoader(queryClient) } : rest;
  };

  const routes: RouteObject[] = [
    {
      Component: RootLayout,
      ErrorBoundary: RootRouteError,
      HydrateFallback: PageSkeleton,
      children: [
        {
          lazy: lazy(() => import('./routes/auth-layout')),
          children: [
            { path: paths.signIn.path, lazy: lazy(() => import('./routes/sign-in')) },
            { path: paths.signUp.path, lazy: lazy(() => import('./routes/sign-up')) },
            { path: paths.resetPassword.path, lazy: lazy(() => import('./routes/reset-password')) },
            { path: paths.resetPasswordConfirm.path, lazy: lazy(() => import('./routes/reset-password-confirm')) },
            { path: paths.invitation.path, lazy: lazy(() => import('./routes/accept-invitation')) },
          ],
        },
        {
          lazy: lazy(() => import('./routes/app-layout')),
          children: [
            {
              // Errors in a page render inside the signed-in layout, keeping the navigation.
              ErrorBoundary: PageRouteError,
              children: [
                { index: true, lazy: lazy(() => import('./routes/home')) },
                { path: paths.team.path, lazy: lazy(() => import('./routes/team')) },
                { path: paths.board.path, lazy: lazy(() => import('./routes/board')) },
                { path: paths.newJob.path, lazy: lazy(() => import('./routes/new-job')) },
                { path: paths.job.path, lazy: lazy(() => import('./routes/job')) },
                { path: paths.clients.path, lazy: lazy(() => import('./routes/clients')) },
                { path: paths.newClient.path, lazy: lazy(() => import('./routes/new-client')) },
                { path: paths.client.path, lazy: lazy(() => import('./routes/client')) },
                { path: paths.newPiano.path, lazy: lazy(() => import('./routes/new-piano')) },
                { path: paths.piano.path, lazy: lazy(() => import('./routes/piano')) },
                { path: paths.newSurvey.path, lazy: lazy(() => import('./routes/new-survey')) },
                { path: paths.survey.path, lazy: lazy(() => import('./routes/survey')) },
                { path: paths.surveyEstimate.path, lazy: lazy(() => import('./routes/survey-estimate')) },
                { path: paths.catalogue.path, lazy: lazy(() => import('./routes/catalogue')) },
                { path: paths.newCatalogueOperation.path, lazy: lazy(() => import('./routes/catalogue-operation')) },
                { path: paths.catalogueOperation.path, lazy: lazy(() => import('./routes/catalogue-operation')) },
                { path: paths.stagesSettings.path, lazy: lazy(() => import('./routes/stages-settings')) },
                { path: paths.wallScreensSettings.path, lazy: lazy(() => import('./routes/wall-screens-settings')) },
                { path: paths.wallPair.path, lazy: lazy(() => import('./routes/wall-pair')) },
                { path: paths.timesheets.path, lazy: lazy(() => import('./routes/timesheets')) },
                { path: paths.parts.path, lazy: lazy(() => import('./routes/parts')) },
                { path: paths.newPart.path, lazy: lazy(() => import('./routes/new-part')) },
                { path: paths.part.path, lazy: lazy(() => import('./routes/part')) },
                { path: paths.margins.path, lazy: lazy(() => import('./routes/margins')) },
                { path: paths.workshopSettings.path, lazy: lazy(() => import('./routes/workshop-settings')) },
                { path: paths.profile.path, lazy: lazy(() => import('./routes/profile')) },
                { path: paths.ivoryHelp.path, lazy: lazy(() => import('./routes/ivory-help')) },
                { path: paths.safetyHelp.path, lazy: lazy(() => import('./routes/safety-help')) },
              ],
            },
          ],
        },
        // The wall screen has its own full-screen layout and its own device session, not a member's.
        { path: paths.wall.path, lazy: lazy(() => import('./routes/wall')) },
        // The client's page answers to its link token alone: no session, no app navigation.
        { path: paths.clientPage.path, lazy: lazy(() => import('./routes/client-page')) },
        { path: '*', lazy: lazy(() => import('./routes/not-found')) },
      ],
    },
  ];

  return createBrowserRouter(routes);
}

export type AppRouter = ReturnType<typeof createRouter>;
