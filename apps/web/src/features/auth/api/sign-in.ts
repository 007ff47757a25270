import type { SessionResponse, SignInRequest } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { storeSession } from '../session-cache';

export function signIn(body: SignInRequest): Promise<SessionResponse> {
  return api.post<SessionResponse>('/auth/sign-in', body, { auth: false });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => storeSession(queryClient, session),
  });
}
