import type { ClaimSourceView, LinkSourceRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export function linkSource(claimId: string, body: LinkSourceRequest): Promise<ClaimSourceView> {
  return api.post<ClaimSourceView>(`/claims/${encodeURIComponent(claimId)}/sources`, body);
}

export function useLinkSource(claimId: string) {
  return useClaimMutation(claimId, (body: LinkSourceRequest) => linkSource(claimId, body));
}
