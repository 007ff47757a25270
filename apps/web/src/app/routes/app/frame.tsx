import { Container, Flex, TabNav, Text } from '@radix-ui/themes';
import { roleLabels } from '@skyledger/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import {
  Outlet,
  redirect,
  Link as RouterLink,
  useLocation,
  useNavigation,
  useNavigationType,
  type LoaderFunctionArgs,
} from 'react-router-dom';
import { Wordmark } from '@/components/ui/wordmark';
import { paths } from '@/config/paths';
import { sessionQueryOptions, useSession } from '@/features/auth/api/get-session';
import { SignOutButton } from '@/features/auth/components/sign-out-button';
import { CurrentUserProvider } from '@/features/auth/current-user';
import { DeskTimeZoneProvider } from '@/lib/desk-time-zone';
import { navItemsFor, type NavItem } from '../../nav-items';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(sessionQueryOptions());
    if (!user) {
      const { pathname, search } = new URL(request.url);
      throw redirect(paths.auth.signIn.getHref(`${pathname}${search}`));
    }
    return null;
  };

function isUnder(pathname: string, to: string): boolean {
  return to === paths.app.desk.getHref()
    ? pathname === to
    : pathname === to || pathname.startsWith(`${to}/`);
}

/** The item whose address is the longest start of the path: /claims/new is "File a claim". */
function currentItem(pathname: string, items: readonly NavItem[]): NavItem | undefined {
  return items
    .filter((item) => isUnder(pathname, item.to))
    .sort((a, b) => b.to.length - a.to.length)[0];
}

/**
 * After a move to another page, focus goes to its heading, so a keyboard or screen-reader
 * user starts there (and hears where they are) rather than at the top of the nav again.
 * Also on arriving from outside the desk (after signing in), where the focus was in a form
 * that is gone. Not on the first page the browser loads, where reading starts at the top
 * anyway, nor when only the hash or query changes (tabs, filters).
 */
function useFocusOnNewPage(pathname: string) {
  const loadedHere = useNavigationType() === 'POP';
  const shown = useRef(loadedHere ? pathname : null);
  useEffect(() => {
    if (shown.current === pathname) return;
    shown.current = pathname;
    const main = document.getElementById('main');
    const heading = main?.querySelector<HTMLElement>('h1');
    if (heading && !heading.hasAttribute('tabindex')) heading.setAttribute('tabindex', '-1');
    (heading ?? main)?.focus({ preventScroll: true });
  }, [pathname]);
}

export function Component() {
  const user = useSession();
  const { pathname } = useLocation();
  const navigation = useNavigation();
  useFocusOnNewPage(pathname);

  // Only between a session ending and the move to the sign-in page.
  if (!user) return null;
  const items = navItemsFor(user.role);
  const current = currentItem(pathname, items);

  return (
    <Flex direction="column" minHeight="100vh">
      <header className="sl-app-header">
        {navigation.state === 'loading' ? (
          <div className="sl-progress" role="progressbar" aria-label="Loading the page" />
        ) : null}
        <a href="#main" className="sl-skip-link">
          Skip to the page
        </a>
        <Container size="4" px={{ initial: '4', sm: '6' }}>
          <Flex justify="between" align="center" gap="4" pt="4" pb="2" wrap="wrap">
            <Flex direction="column" align="start" gap="1">
              <Wordmark />
              <Text size="1" color="gray">
                {user.newsroomName} desk · times in {user.deskTimeZone.replaceAll('_', ' ')}
              </Text>
            </Flex>
            <Flex align="center" gap="4">
              <Flex direction="column" align="end">
                <Text size="2" weight="bold">
                  {user.displayName}
                </Text>
                <Text size="1" color="gray">
                  {roleLabels[user.role]}
                </Text>
              </Flex>
              <SignOutButton />
            </Flex>
          </Flex>
          <TabNav.Root aria-label="Desk sections" size="2" className="sl-scroll-x sl-desk-nav">
            {items.map((item) => (
              <TabNav.Link key={item.id} asChild active={item === current}>
                <RouterLink to={item.to}>{item.label}</RouterLink>
              </TabNav.Link>
            ))}
          </TabNav.Root>
        </Container>
      </header>
      <main id="main" tabIndex={-1} className="sl-app-main">
        <Container size="4" px={{ initial: '4', sm: '6' }} py={{ initial: '5', sm: '7' }}>
          <CurrentUserProvider user={user}>
            <DeskTimeZoneProvider timeZone={user.deskTimeZone}>
              <Outlet />
            </DeskTimeZoneProvider>
          </CurrentUserProvider>
        </Container>
      </main>
    </Flex>
  );
}
