import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { DocumentTitle } from '@/components/ui/document-title';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { outboxQueryOptions, parseOutboxSearch } from '@/features/outbox/api/get-outbox';
import { OutboxPage } from '@/features/outbox/components/outbox-page';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(sessionQueryOptions());
    if (user && mayOpen(user.role, 'outbox')) {
      const query = parseOutboxSearch(new URL(request.url).searchParams);
      await queryClient.ensureQueryData(outboxQueryOptions(query));
    }
    return null;
  };

export function Component() {
  const user = useCurrentUser();
  if (!mayOpen(user.role, 'outbox')) return <NoAccess item={navItem('outbox')} />;
  return (
    <>
      <DocumentTitle title="Outbox" />
      <OutboxPage />
    </>
  );
}
