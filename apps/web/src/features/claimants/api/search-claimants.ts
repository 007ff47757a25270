import type { ClaimantView } from '@skyledger/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { claimantKeys } from './claimant-keys';

/** Up to 20 claimants whose name, or a word of it, starts with `q`. */
export function searchClaimants(q: string): Promise<ClaimantView[]> {
  return api.get<ClaimantView[]>('/claimants', { params: { q } });
}

export const claimantSearchQueryOptions = (q: string) =>
  queryOptions({
    queryKey: claimantKeys.search(q),
    queryFn: () => searchClaimants(q),
    enabled: q.length > 0,
    placeholderData: keepPreviousData,
  });

export function useClaimantSearch(q: string) {
  return useQuery(claimantSearchQueryOptions(q.trim()));
}
