import type { WorkingView } from '@skyledger/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { workingKeys } from './working-keys';

/** A claim's workings, oldest first. */
export function getClaimWorkings(claimId: string): Promise<WorkingView[]> {
  return api.get<WorkingView[]>(`/claims/${encodeURIComponent(claimId)}/workings`);
}

export const claimWorkingsQueryOptions = (claimId: string) =>
  queryOptions({
    queryKey: workingKeys.claim(claimId),
    queryFn: () => getClaimWorkings(claimId),
  });

/** Not suspending: the section shows its own loading state inside the claim page. */
export function useClaimWorkings(claimId: string) {
  return useQuery(claimWorkingsQueryOptions(claimId));
}
