import type { SessionResponse } from '@skyledger/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { setAccessToken } from '@/lib/api-client';
import { authKeys } from './api/auth-keys';

/** Starts a session after sign-in: the token in memory, the person in the cache. */
export function storeSession(queryClient: QueryClient, session: SessionResponse): void {
  setAccessToken(session.accessToken);
  // Nothing cached for a previous person may show to the next one.
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
  queryClient.setQueryData(authKeys.session(), session.user);
}

/** A refresh may bring a changed name or role; the token itself is already stored. */
export function updateSessionUser(queryClient: QueryClient, session: SessionResponse): void {
  queryClient.setQueryData(authKeys.session(), session.user);
}

export function clearSession(queryClient: QueryClient): void {
  setAccessToken(null);
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
  queryClient.setQueryData(authKeys.session(), null);
}
