import type { QueryClient } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { useCurrentUser } from '@/features/auth/current-user';
import { signoffQueryOptions } from '@/features/verdicts/api/get-signoff';
import { SignoffPage } from '@/features/verdicts/components/signoff/signoff-page';
import { verdictPageLoader } from './verdict-route-data';

export const clientLoader = (queryClient: QueryClient) =>
  verdictPageLoader(queryClient, (claimId) =>
    queryClient.ensureQueryData(signoffQueryOptions(claimId)),
  );

export function Component() {
  const user = useCurrentUser();
  const { claimId = '' } = useParams();
  return <SignoffPage key={claimId} claimId={claimId} user={user} />;
}
