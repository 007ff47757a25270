import type { SignoffView } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { verdictKeys } from './verdict-keys';

/** The version awaiting sign-off, the one before it, the checklist, and whether I may decide. */
export function getSignoff(claimId: string): Promise<SignoffView> {
  return api.get<SignoffView>(`/claims/${encodeURIComponent(claimId)}/signoff`);
}

export const signoffQueryOptions = (claimId: string) =>
  queryOptions({ queryKey: verdictKeys.signoff(claimId), queryFn: () => getSignoff(claimId) });

export function useSignoff(claimId: string) {
  return useSuspenseQuery(signoffQueryOptions(claimId));
}
