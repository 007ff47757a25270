import { useMutation, useQueryClient } from '@tanstack/react-query';
import { claimKeys } from '@/features/claims/api/claim-keys';
import { isApiError } from '@/lib/api-client';
import { workingKeys } from './working-keys';

/**
 * A change to one of a claim's workings. The list and the claim's history are refreshed
 * after it (returned, so the mutation stays pending until they are); a 409 reloads the
 * list too, so the next attempt starts from what is stored.
 */
export function useWorkingMutation<Variables, Result>(
  claimId: string,
  mutationFn: (variables: Variables) => Promise<Result>,
) {
  const queryClient = useQueryClient();
  const refresh = () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: workingKeys.claim(claimId) }),
      queryClient.invalidateQueries({ queryKey: claimKeys.history(claimId) }),
    ]);
  return useMutation({
    mutationFn,
    onSuccess: () => refresh(),
    onError: (error) => {
      if (isApiError(error) && error.status === 409) return refresh();
    },
  });
}
