import type { CommentView, CreateCommentRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export function addComment(claimId: string, body: CreateCommentRequest): Promise<CommentView> {
  return api.post<CommentView>(`/claims/${encodeURIComponent(claimId)}/comments`, body);
}

export function useAddComment(claimId: string) {
  return useClaimMutation(claimId, (body: CreateCommentRequest) => addComment(claimId, body));
}
