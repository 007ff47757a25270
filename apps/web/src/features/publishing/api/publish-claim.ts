import type { PublicationView, PublishClaimRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { usePublishingMutation } from './use-publishing-mutation';

/** Publishes the cleared version now, or schedules it (`at` with its `timeZone`). */
export function publishClaim(
  claimId: string,
  body: PublishClaimRequest,
): Promise<PublicationView[]> {
  return api.post<PublicationView[]>(`/claims/${encodeURIComponent(claimId)}/publish`, body);
}

export function usePublishClaim(claimId: string) {
  return usePublishingMutation(claimId, (body: PublishClaimRequest) => publishClaim(claimId, body));
}
