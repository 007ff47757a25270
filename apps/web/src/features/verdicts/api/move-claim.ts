import type { ClaimTransitionRequest } from '@skyledger/contracts';
import { transitionClaim } from '@/features/claims/api/transition-claim';
import { useVerdictMutation } from './use-verdict-mutation';

/** Submit for sign-off, send back or clear: the moves of the claim life a verdict makes. */
export function useMoveClaim(claimId: string) {
  return useVerdictMutation(claimId, (body: ClaimTransitionRequest) =>
    transitionClaim(claimId, body),
  );
}
