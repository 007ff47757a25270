import type { QueryClient } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { useCurrentUser } from '@/features/auth/current-user';
import { claimVerdictQueryOptions } from '@/features/verdicts/api/get-claim-verdict';
import { VerdictPage } from '@/features/verdicts/components/verdict-page';
import { verdictPageLoader } from './verdict-route-data';

export const clientLoader = (queryClient: QueryClient) =>
  verdictPageLoader(queryClient, (claimId) =>
    queryClient.ensureQueryData(claimVerdictQueryOptions(claimId)),
  );

export function Component() {
  const user = useCurrentUser();
  const { claimId = '' } = useParams();
  // A fresh page per claim, so nothing typed about one is shown on the next.
  return <VerdictPage key={claimId} claimId={claimId} user={user} />;
}
