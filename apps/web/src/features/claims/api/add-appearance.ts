import type { AppearanceView, CreateAppearanceRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export function addAppearance(
  claimId: string,
  body: CreateAppearanceRequest,
): Promise<AppearanceView> {
  return api.post<AppearanceView>(`/claims/${encodeURIComponent(claimId)}/appearances`, body);
}

export function useAddAppearance(claimId: string) {
  return useClaimMutation(claimId, (body: CreateAppearanceRequest) => addAppearance(claimId, body));
}
