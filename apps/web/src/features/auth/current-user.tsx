import type { CurrentUser } from '@skyledger/contracts';
import { createContext, use, type ReactNode } from 'react';

// The signed-in frame hands its person down, so a screen inside it always has one,
// even while a sign-out clears the session and the frame is on its way out.
const CurrentUserContext = createContext<CurrentUser | null>(null);

export function CurrentUserProvider({
  user,
  children,
}: {
  user: CurrentUser;
  children: ReactNode;
}) {
  return <CurrentUserContext value={user}>{children}</CurrentUserContext>;
}

/** The signed-in person, for screens inside the signed-in frame. */
export function useCurrentUser(): CurrentUser {
  const user = use(CurrentUserContext);
  if (!user) throw new Error('useCurrentUser is only for screens inside the signed-in frame');
  return user;
}
