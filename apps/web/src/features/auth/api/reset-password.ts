import type { PasswordResetRequest } from '@skyledger/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function resetPassword(body: PasswordResetRequest): Promise<void> {
  return api.post<void>('/auth/password-reset', body, { auth: false });
}

export function useResetPassword() {
  return useMutation({ mutationFn: resetPassword });
}
