import type { ClaimVerdictView } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { verdictKeys } from './verdict-keys';

/** Every version of a claim's verdict, newest first, and the saves that lost a race. */
export function getClaimVerdict(claimId: string): Promise<ClaimVerdictView> {
  return api.get<ClaimVerdictView>(`/claims/${encodeURIComponent(claimId)}/verdict`);
}

export const claimVerdictQueryOptions = (claimId: string) =>
  queryOptions({ queryKey: verdictKeys.claim(claimId), queryFn: () => getClaimVerdict(claimId) });

export function useClaimVerdict(claimId: string) {
  return useSuspenseQuery(claimVerdictQueryOptions(claimId));
}
