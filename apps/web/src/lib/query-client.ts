import { QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { isApiError } from './api-client';

export const queryConfig = {
  queries: {
    staleTime: 30_000,
    refetchOnWindowFocus: false,
    // A 4xx will not change by asking again; only network trouble and 5xx are retried.
    retry: (failureCount, error) =>
      failureCount < 2 && (!isApiError(error) || error.status === 0 || error.status >= 500),
  },
} satisfies DefaultOptions;

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: queryConfig });
}
