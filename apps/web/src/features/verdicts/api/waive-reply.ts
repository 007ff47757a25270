import type { ReplyWaiverRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useVerdictMutation } from './use-verdict-mutation';

/** A desk chief waives the right of reply, with the reason the checklist then shows. */
export function waiveReply(claimId: string, body: ReplyWaiverRequest): Promise<void> {
  return api.put<void>(`/claims/${encodeURIComponent(claimId)}/reply-waiver`, body);
}

export function useWaiveReply(claimId: string) {
  return useVerdictMutation(claimId, (body: ReplyWaiverRequest) => waiveReply(claimId, body));
}
