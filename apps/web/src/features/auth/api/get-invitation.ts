import type { InvitationInfo } from '@skyledger/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { authKeys } from './auth-keys';

export function getInvitation(token: string): Promise<InvitationInfo> {
  return api.get<InvitationInfo>(`/auth/invitations/${encodeURIComponent(token)}`, {
    auth: false,
  });
}

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: () => getInvitation(token),
    staleTime: Infinity,
    retry: false,
    // A used or expired link (404/410) stays so; asking again on mount changes nothing.
    retryOnMount: false,
  });

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}
