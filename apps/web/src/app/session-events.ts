import type { QueryClient } from '@tanstack/react-query';
import type { DataRouter } from 'react-router-dom';
import { paths } from '@/config/paths';
import { clearSession, updateSessionUser } from '@/features/auth/session-cache';
import { setSessionEvents } from '@/lib/api-client';

/** What the app does when the API client refreshes a session or finds it over. */
export function connectSessionEvents(queryClient: QueryClient, router: DataRouter): void {
  setSessionEvents({
    onRefreshed: (session) => updateSessionUser(queryClient, session),
    onExpired: () => {
      // Mid-navigation, the page the person was opening is where they go back to.
      const { pathname, search } = router.state.navigation.location ?? router.state.location;
      // Leave the signed-in frame first, so it never renders without a person.
      void router
        .navigate(paths.auth.signIn.getHref(`${pathname}${search}`), { replace: true })
        .then(() => clearSession(queryClient));
    },
  });
}
