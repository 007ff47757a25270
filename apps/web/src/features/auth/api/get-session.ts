import type { CurrentUser } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { isApiError, refreshSession } from '@/lib/api-client';
import { authKeys } from './auth-keys';

/** On app start, trades the refresh cookie for a session; null when nobody is signed in. */
export async function restoreSession(): Promise<CurrentUser | null> {
  try {
    return (await refreshSession()).user;
  } catch (error) {
    if (isApiError(error) && error.status >= 400 && error.status < 500) return null;
    throw error;
  }
}

// Sign-in, sign-out and token refreshes write this entry; it is never refetched on its own.
export const sessionQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.session(),
    queryFn: restoreSession,
    staleTime: Infinity,
    gcTime: Infinity,
    retry: false,
  });

export function useSession(): CurrentUser | null {
  return useSuspenseQuery(sessionQueryOptions()).data;
}
