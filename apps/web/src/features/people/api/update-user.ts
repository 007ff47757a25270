import type { UpdateUserRequest, UserListItem } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';
import { userKeys } from './user-keys';

export type UpdateUserInput = UpdateUserRequest & { id: string };

export function updateUser({ id, ...body }: UpdateUserInput): Promise<UserListItem> {
  return api.patch<UserListItem>(`/users/${encodeURIComponent(id)}`, body);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    // Returning the refetch keeps the mutation pending until the table shows the change.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
    onError: (error) => {
      // 409: the version we sent is stale; reload so the next attempt starts from the truth.
      if (isApiError(error) && error.status === 409) {
        return queryClient.invalidateQueries({ queryKey: userKeys.lists() });
      }
    },
  });
}
