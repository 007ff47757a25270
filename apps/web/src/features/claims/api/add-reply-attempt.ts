import type { CreateReplyAttemptRequest, ReplyAttemptView } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export function addReplyAttempt(
  claimId: string,
  body: CreateReplyAttemptRequest,
): Promise<ReplyAttemptView> {
  return api.post<ReplyAttemptView>(`/claims/${encodeURIComponent(claimId)}/reply-attempts`, body);
}

export function useAddReplyAttempt(claimId: string) {
  return useClaimMutation(claimId, (body: CreateReplyAttemptRequest) =>
    addReplyAttempt(claimId, body),
  );
}
