import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function resendInvitation(userId: string): Promise<void> {
  return api.post<void>(`/users/${encodeURIComponent(userId)}/invitation`);
}

export function useResendInvitation() {
  return useMutation({ mutationFn: resendInvitation });
}
