import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { clearSession } from '../session-cache';

export function signOut(): Promise<void> {
  return api.post<void>('/auth/sign-out');
}

export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: signOut,
    // Signed out locally even when the request fails: the person asked to leave.
    onSettled: async () => {
      // Leave the signed-in frame first, so it never renders without a person.
      await navigate(paths.auth.signIn.getHref(), { replace: true });
      clearSession(queryClient);
    },
  });
}
