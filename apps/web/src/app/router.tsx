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
                  path: paths.app.people.path,
                  lazy: lazy(() => import('./routes/app/people')),
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
