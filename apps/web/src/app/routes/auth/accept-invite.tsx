import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PlainCard } from '@/components/layouts/plain-card';
import { PlainLayout } from '@/components/layouts/plain-layout';
import { DocumentTitle } from '@/components/ui/document-title';
import { invitationQueryOptions } from '@/features/auth/api/get-invitation';
import { AcceptInvitation } from '@/features/auth/components/accept-invitation';
import { MissingToken } from './missing-token';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const token = new URL(request.url).searchParams.get('token');
    // prefetch, not ensure: a used or expired link is an answer the page shows, not a crash.
    if (token) await queryClient.prefetchQuery(invitationQueryOptions(token));
    return null;
  };

export function Component() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token');

  return (
    <PlainLayout>
      <DocumentTitle title="Accept your invitation" />
      <PlainCard
        title="Join the desk"
        intro="Check the details of your invitation, then choose the password you will sign in with."
      >
        {token ? <AcceptInvitation token={token} /> : <MissingToken what="invitation" />}
      </PlainCard>
    </PlainLayout>
  );
}
