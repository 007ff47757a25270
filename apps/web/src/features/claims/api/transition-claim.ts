import type { ClaimDetail, ClaimTransitionRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export function transitionClaim(id: string, body: ClaimTransitionRequest): Promise<ClaimDetail> {
  return api.post<ClaimDetail>(`/claims/${encodeURIComponent(id)}/transitions`, body);
}

export function useTransitionClaim(id: string) {
  return useClaimMutation(id, (body: ClaimTransitionRequest) => transitionClaim(id, body));
}
