import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import {
  createBrowserRouter,
  type DataRouter,
  type LoaderFunction,
  type RouteObject,
} from 'react-router-dom';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { paths } from '@/config/paths';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { PageErrorBoundary, RootErrorBoundary } from './routes/route-error';

/** What a lazy route module exports: its screen and, if it needs data, a loader factory. */
interface RouteModule {
  Component: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

function lazyRoute(
  queryClient: QueryClient,
  importModule: () => Promise<RouteModule>,
): NonNullable<RouteObject['lazy']> {
  return async () => {
    const { Component, clientLoader } = await importModule();
    return clientLoader ? { Component, loader: clientLoader(queryClient) } : { Component };
  };
}

export function createAppRoutes(queryClient: QueryClient): RouteObject[] {
  const lazy = (importModule: () => Promise<RouteModule>) => lazyRoute(queryClient, importModule);
  return [
    {
      id: 'root',
      path: paths.app.desk.path,
      // The first load trades the refresh cookie for a session, once; later loads read the cache.
      loader: async () => {
        await queryClient.ensureQueryData(sessionQueryOptions());
        return null;
      },
      hydrateFallbackElement: <LoadingScreen />,
      errorElement: <RootErrorBoundary />,
      children: [
        { path: paths.auth.signIn.path, lazy: lazy(() => import('./routes/auth/sign-in')) },
        {
          path: paths.auth.forgotPassword.path,
          lazy: lazy(() => import('./routes/auth/forgot-password')),
        },
        {
          path: paths.auth.resetPassword.path,
          lazy: lazy(() => import('./routes/auth/reset-password')),
        },
        {
          path: paths.auth.acceptInvite.path,
          lazy: lazy(() => import('./routes/auth/accept-invite')),
        },
        {
          id: 'frame',
          lazy: lazy(() => import('./routes/app/frame')),
          children: [
            {
              errorElement: <PageErrorBoundary />,
              children: [
                { index: true, lazy: lazy(() => import('./routes/app/desk-home')) },
                {
                  path: paths.app.queue.path,
                  lazy: lazy(() => import('./routes/app/claims-queue')),
                },
                {
                  path: paths.app.fileClaim.path,
                  lazy: lazy(() => import('./routes/app/file-claim')),
                },
                {
                  path: paths.app.claim.path,
                  lazy: lazy(() => import('./routes/app/claim')),
                },
                {
                  path: paths.app.verdict.path,
                  lazy: lazy(() => import('./routes/app/verdict')),
                },
                {
                  path: paths.app.signoff.path,
                  lazy: lazy(() => import('./routes/app/signoff')),
                },
                {
                  path: paths.app.search.path,
                  lazy: lazy(() => import('./routes/app/search')),
                },
                {
                  path: paths.app.datasets.path,
                  lazy: lazy(() => import('./routes/app/datasets')),
                },
                {
                  path: paths.app.newDataset.path,
                  lazy: lazy(() => import('./routes/app/new-dataset')),
                },
                {
                  path: paths.app.dataset.path,
                  lazy: lazy(() => import('./routes/app/dataset')),
                },
                {
                  path: paths.app.workbench.path,
                  lazy: lazy(() => import('./routes/app/workbench')),
                },
                {
                  path: paths.app.people.path,
                  lazy: lazy(() => import('./routes/app/people')),
                },
                {
                  path: paths.app.ratingScale.path,
                  lazy: lazy(() => import('./routes/app/rating-scale')),
                },
                {
                  path: paths.app.outbox.path,
                  lazy: lazy(() => import('./routes/app/outbox')),
                },
                {
                  path: paths.app.audit.path,
                  lazy: lazy(() => import('./routes/app/audit')),
                },
                {
                  path: paths.app.account.path,
                  lazy: lazy(() => import('./routes/app/account')),
                },
              ],
            },
          ],
        },
        { path: '*', lazy: lazy(() => import('./routes/not-found')) },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient): DataRouter {
  return createBrowserRouter(createAppRoutes(queryClient));
}
