import type { ClaimDetail, UpdateClaimRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export function updateClaim(id: string, body: UpdateClaimRequest): Promise<ClaimDetail> {
  return api.patch<ClaimDetail>(`/claims/${encodeURIComponent(id)}`, body);
}

export function useUpdateClaim(id: string) {
  return useClaimMutation(id, (body: UpdateClaimRequest) => updateClaim(id, body));
}
