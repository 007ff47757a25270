import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { DocumentTitle } from '@/components/ui/document-title';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { searchQueryOptions } from '@/features/search/api/search-desk';
import { isSearchable, parseSearchUrl } from '@/features/search/api/search-url';
import { SearchPage } from '@/features/search/components/search-page';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(sessionQueryOptions());
    const view = parseSearchUrl(new URL(request.url).searchParams);
    if (user && mayOpen(user.role, 'search') && isSearchable(view)) {
      // Started, not awaited: the page shows its own loading and error states beside the
      // search box, and keeps the last results on screen while the next ones load.
      void queryClient.prefetchQuery(searchQueryOptions(view));
    }
    return null;
  };

export function Component() {
  const user = useCurrentUser();
  if (!mayOpen(user.role, 'search')) return <NoAccess item={navItem('search')} />;
  return (
    <>
      <DocumentTitle title="Search" />
      <SearchPage role={user.role} />
    </>
  );
}
