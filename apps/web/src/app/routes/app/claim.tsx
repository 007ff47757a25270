import type { QueryClient } from '@tanstack/react-query';
import { uuidSchema } from '@skyledger/contracts';
import { data, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { claimQueryOptions } from '@/features/claims/api/get-claim';
import { ClaimView } from '@/features/claims/components/claim/claim-view';
import { deskPeopleQueryOptions } from '@/features/people/api/get-desk-people';
import { isApiError } from '@/lib/api-client';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    // Loaders run side by side with the frame's: ask for nothing until there is a session.
    if (!(await queryClient.ensureQueryData(sessionQueryOptions()))) return null;
    const claimId = params.claimId ?? '';
    // An address that names no claim is a page that does not exist, not a failed page.
    if (!uuidSchema.safeParse(claimId).success) throw data(null, { status: 404 });
    await Promise.all([
      queryClient.ensureQueryData(claimQueryOptions(claimId)).catch((error: unknown) => {
        throw isApiError(error) && error.status === 404 ? data(null, { status: 404 }) : error;
      }),
      queryClient.ensureQueryData(deskPeopleQueryOptions()),
    ]);
    return null;
  };

export function Component() {
  const user = useCurrentUser();
  const { claimId = '' } = useParams();
  // A fresh page per claim, so nothing typed or said about one is shown on the next.
  return <ClaimView key={claimId} claimId={claimId} user={user} />;
}
