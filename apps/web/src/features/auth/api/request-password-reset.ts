import type { PasswordResetRequestRequest } from '@skyledger/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function requestPasswordReset(body: PasswordResetRequestRequest): Promise<void> {
  return api.post<void>('/auth/password-reset/request', body, { auth: false });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
