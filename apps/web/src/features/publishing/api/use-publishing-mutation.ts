import type { PublicationView } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { claimKeys } from '@/features/claims/api/claim-keys';
import { verdictKeys } from '@/features/verdicts/api/verdict-keys';
import { isApiError } from '@/lib/api-client';
import { publicationKeys } from './publication-keys';

/**
 * Publishing, scheduling or cancelling a schedule. The publications the API answers go
 * straight into the cache; the claim (its status, version and history), its verdict
 * versions (the published one changes) and the queue are refreshed after it, and after
 * a 409 too, so the next attempt starts from what is stored.
 */
export function usePublishingMutation<Variables>(
  claimId: string,
  mutationFn: (variables: Variables) => Promise<PublicationView[]>,
) {
  const queryClient = useQueryClient();
  const refreshClaim = () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: claimKeys.detail(claimId) }),
      queryClient.invalidateQueries({ queryKey: claimKeys.lists() }),
      queryClient.invalidateQueries({ queryKey: verdictKeys.claim(claimId) }),
    ]);
  return useMutation({
    mutationFn,
    onSuccess: (publications) => {
      queryClient.setQueryData(publicationKeys.claim(claimId), publications);
      return refreshClaim();
    },
    onError: (error) => {
      if (isApiError(error) && error.status === 409) {
        return Promise.all([
          refreshClaim(),
          queryClient.invalidateQueries({ queryKey: publicationKeys.claim(claimId) }),
        ]);
      }
    },
  });
}
