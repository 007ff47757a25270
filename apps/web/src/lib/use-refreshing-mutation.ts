import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { isApiError } from './api-client';

/**
 * A change whose result other queries show. They are refreshed after it succeeds (returned,
 * so the mutation stays pending until they are), and after a 409 too, so the next attempt
 * starts from what is stored.
 */
export function useRefreshingMutation<Variables, Result>(
  queryKeys: readonly QueryKey[],
  mutationFn: (variables: Variables) => Promise<Result>,
) {
  const queryClient = useQueryClient();
  const refresh = () =>
    Promise.all(queryKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
  return useMutation({
    mutationFn,
    onSuccess: () => refresh(),
    onError: (error) => {
      if (isApiError(error) && error.status === 409) return refresh();
    },
  });
}
