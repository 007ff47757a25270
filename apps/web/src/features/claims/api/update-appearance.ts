import type { AppearanceView, UpdateAppearanceRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export interface UpdateAppearanceInput extends UpdateAppearanceRequest {
  appearanceId: string;
}

export function updateAppearance(
  claimId: string,
  { appearanceId, ...body }: UpdateAppearanceInput,
): Promise<AppearanceView> {
  return api.patch<AppearanceView>(
    `/claims/${encodeURIComponent(claimId)}/appearances/${encodeURIComponent(appearanceId)}`,
    body,
  );
}

export function useUpdateAppearance(claimId: string) {
  return useClaimMutation(claimId, (input: UpdateAppearanceInput) =>
    updateAppearance(claimId, input),
  );
}
