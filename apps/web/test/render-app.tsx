import { QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { createAppRoutes } from '@/app/router';
import { connectSessionEvents } from '@/app/session-events';
import { queryConfig } from '@/lib/query-client';

/** The whole desk at one URL, as main.tsx builds it, with a fresh cache and no retries. */
export function renderApp(url: string) {
  const queryClient = new QueryClient({
    defaultOptions: {
      queries: { ...queryConfig.queries, retry: false },
      mutations: { retry: false },
    },
  });
  const router = createMemoryRouter(createAppRoutes(queryClient), { initialEntries: [url] });
  connectSessionEvents(queryClient, router);
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  const location = () => `${router.state.location.pathname}${router.state.location.search}`;
  return { user, router, queryClient, location };
}
