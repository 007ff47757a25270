import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { DocumentTitle } from '@/components/ui/document-title';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { parseUsersSort, usersQueryOptions } from '@/features/people/api/get-users';
import { PeopleDirectory } from '@/features/people/components/people-directory';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(sessionQueryOptions());
    if (user && mayOpen(user.role, 'people')) {
      const sort = parseUsersSort(new URL(request.url).searchParams);
      await queryClient.ensureQueryData(usersQueryOptions(sort));
    }
    return null;
  };

export function Component() {
  const user = useCurrentUser();
  if (!mayOpen(user.role, 'people')) return <NoAccess item={navItem('people')} />;
  return (
    <>
      <DocumentTitle title="People" />
      <PeopleDirectory currentUserId={user.id} />
    </>
  );
}
