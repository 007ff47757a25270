import { claimKeys } from '@/features/claims/api/claim-keys';
import { useRefreshingMutation } from '@/lib/use-refreshing-mutation';
import { verdictKeys } from './verdict-keys';

/**
 * A change to a claim's verdict or its place in the claim life: the verdict, the sign-off
 * view, the claim (its status and history) and the queue are refreshed after it.
 */
export function useVerdictMutation<Variables, Result>(
  claimId: string,
  mutationFn: (variables: Variables) => Promise<Result>,
) {
  return useRefreshingMutation(
    [verdictKeys.claim(claimId), claimKeys.detail(claimId), claimKeys.lists()],
    mutationFn,
  );
}
