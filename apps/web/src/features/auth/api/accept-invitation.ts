import type { AcceptInvitationRequest } from '@skyledger/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function acceptInvitation(body: AcceptInvitationRequest): Promise<void> {
  return api.post<void>('/auth/invitations/accept', body, { auth: false });
}

export function useAcceptInvitation() {
  return useMutation({ mutationFn: acceptInvitation });
}
