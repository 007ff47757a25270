import type { ClaimDetail } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { claimKeys } from './claim-keys';

export function getClaim(id: string): Promise<ClaimDetail> {
  return api.get<ClaimDetail>(`/claims/${encodeURIComponent(id)}`);
}

export const claimQueryOptions = (id: string) =>
  queryOptions({ queryKey: claimKeys.detail(id), queryFn: () => getClaim(id) });

export function useClaim(id: string) {
  return useSuspenseQuery(claimQueryOptions(id));
}
