import type { ClaimHistoryEvent } from '@skyledger/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { claimKeys } from './claim-keys';

export function getClaimHistory(id: string): Promise<ClaimHistoryEvent[]> {
  return api.get<ClaimHistoryEvent[]>(`/claims/${encodeURIComponent(id)}/history`);
}

export const claimHistoryQueryOptions = (id: string) =>
  queryOptions({ queryKey: claimKeys.history(id), queryFn: () => getClaimHistory(id) });

/** Not suspended: the history loads after the rest of the claim page is readable. */
export function useClaimHistory(id: string) {
  return useQuery(claimHistoryQueryOptions(id));
}
