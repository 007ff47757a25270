import type { AssignClaimRequest, ClaimDetail } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export function assignClaim(id: string, body: AssignClaimRequest): Promise<ClaimDetail> {
  return api.post<ClaimDetail>(`/claims/${encodeURIComponent(id)}/assign`, body);
}

export function useAssignClaim(id: string) {
  return useClaimMutation(id, (body: AssignClaimRequest) => assignClaim(id, body));
}
