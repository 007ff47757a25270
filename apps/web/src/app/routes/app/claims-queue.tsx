import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { DocumentTitle } from '@/components/ui/document-title';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { claimsQueryOptions } from '@/features/claims/api/get-claims';
import { parseQueueSearch } from '@/features/claims/api/queue-search';
import { ClaimsQueue } from '@/features/claims/components/queue/claims-queue';
import { deskPeopleQueryOptions } from '@/features/people/api/get-desk-people';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(sessionQueryOptions());
    if (user && mayOpen(user.role, 'queue')) {
      const query = parseQueueSearch(new URL(request.url).searchParams);
      await Promise.all([
        queryClient.ensureQueryData(claimsQueryOptions(query)),
        queryClient.ensureQueryData(deskPeopleQueryOptions()),
      ]);
    }
    return null;
  };

export function Component() {
  const user = useCurrentUser();
  if (!mayOpen(user.role, 'queue')) return <NoAccess item={navItem('queue')} />;
  return (
    <>
      <DocumentTitle title="Claims" />
      <ClaimsQueue user={user} />
    </>
  );
}
