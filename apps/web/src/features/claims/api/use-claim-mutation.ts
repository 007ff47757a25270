import type { ClaimDetail } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { isApiError } from '@/lib/api-client';
import { claimKeys } from './claim-keys';

function isClaimDetail(value: unknown): value is ClaimDetail {
  return typeof value === 'object' && value !== null && 'appearances' in value;
}

/**
 * A change to one claim or to a record under it. The claim page, its history and the
 * queue are refreshed after it (returned, so the mutation stays pending until they are);
 * a claim the API sends back goes straight into the cache. A 409 reloads the claim too,
 * so the next attempt starts from what is stored.
 */
export function useClaimMutation<Variables, Result>(
  claimId: string,
  mutationFn: (variables: Variables) => Promise<Result>,
) {
  const queryClient = useQueryClient();
  const refresh = () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: claimKeys.detail(claimId) }),
      queryClient.invalidateQueries({ queryKey: claimKeys.lists() }),
    ]);
  return useMutation({
    mutationFn,
    onSuccess: (result) => {
      if (isClaimDetail(result)) queryClient.setQueryData(claimKeys.detail(claimId), result);
      return refresh();
    },
    onError: (error) => {
      if (isApiError(error) && error.status === 409) return refresh();
    },
  });
}
