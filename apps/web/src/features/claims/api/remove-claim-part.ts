import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

/** The records under a claim that `DELETE /claims/:id/<path>/:partId` removes. */
export type ClaimPartPath = 'appearances' | 'reply-attempts' | 'consultations' | 'comments';

export function removeClaimPart(claimId: string, path: ClaimPartPath, partId: string) {
  return api.delete(`/claims/${encodeURIComponent(claimId)}/${path}/${encodeURIComponent(partId)}`);
}

export function useRemoveClaimPart(claimId: string, path: ClaimPartPath) {
  return useClaimMutation(claimId, (partId: string) => removeClaimPart(claimId, path, partId));
}
