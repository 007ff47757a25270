import type { ClaimQueueQuery, ClaimQueueResponse } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { claimKeys } from './claim-keys';

export function getClaims(query: ClaimQueueQuery): Promise<ClaimQueueResponse> {
  const params: Record<string, string | number | undefined> = {};
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined) params[key] = typeof value === 'boolean' ? String(value) : value;
  }
  return api.get<ClaimQueueResponse>('/claims', { params });
}

export const claimsQueryOptions = (query: ClaimQueueQuery) =>
  queryOptions({
    queryKey: claimKeys.list(query),
    queryFn: () => getClaims(query),
  });

export function useClaims(query: ClaimQueueQuery) {
  return useSuspenseQuery(claimsQueryOptions(query));
}
