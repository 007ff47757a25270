import type { InviteUserRequest, UserListItem } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

export function inviteUser(body: InviteUserRequest): Promise<UserListItem> {
  return api.post<UserListItem>('/users/invitations', body);
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
