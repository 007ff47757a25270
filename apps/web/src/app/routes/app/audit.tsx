import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { DocumentTitle } from '@/components/ui/document-title';
import { parseAuditSearch } from '@/features/audit/api/audit-search';
import { auditEventsQueryOptions } from '@/features/audit/api/get-audit-events';
import { AuditTrail } from '@/features/audit/components/audit-trail';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { deskPeopleQueryOptions } from '@/features/people/api/get-desk-people';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(sessionQueryOptions());
    if (user && mayOpen(user.role, 'audit')) {
      const query = parseAuditSearch(new URL(request.url).searchParams);
      await Promise.all([
        queryClient.ensureQueryData(auditEventsQueryOptions(query)),
        queryClient.ensureQueryData(deskPeopleQueryOptions()),
      ]);
    }
    return null;
  };

export function Component() {
  const user = useCurrentUser();
  if (!mayOpen(user.role, 'audit')) return <NoAccess item={navItem('audit')} />;
  return (
    <>
      <DocumentTitle title="Audit trail" />
      <AuditTrail />
    </>
  );
}
