import type { VerdictVersionState } from '@skyledger/contracts';
import { isApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/api-error-messages';

export const verdictStateLabels: Record<VerdictVersionState, string> = {
  draft: 'Draft',
  submitted: 'Awaiting sign-off',
  sent_back: 'Sent back',
  cleared: 'Cleared',
  published: 'Published',
  superseded: 'Superseded',
};

// The colour only repeats what the words say; the words are always there.
export const verdictStateColors = {
  draft: 'gray',
  submitted: 'amber',
  sent_back: 'orange',
  cleared: 'teal',
  published: 'jade',
  superseded: 'gray',
} as const satisfies Record<VerdictVersionState, string>;

/** Said when the claim moved on meanwhile: the page now shows it as it stands. */
export const staleClaimMoveMessage =
  'Someone else changed this claim meanwhile, so nothing happened. The page now shows it as it stands: check it, then try again.';

/**
 * The API's refusal of a move in its own words ("You drafted this version: someone else
 * signs it off"), which say more than a generic "no access".
 */
export function refusalMessage(error: unknown): string {
  if (!isApiError(error)) return errorMessage(error);
  if (error.status === 409 && error.body.fields?.version === 'stale') return staleClaimMoveMessage;
  return [403, 409, 422].includes(error.status) ? error.message : errorMessage(error);
}
