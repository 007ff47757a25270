import type { CreateVerdictVersionRequest, VerdictVersionView } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useVerdictMutation } from './use-verdict-mutation';

/** A new draft: from the latest version when there is one, else from the server's template. */
export function startDraft(
  claimId: string,
  body: CreateVerdictVersionRequest = {},
): Promise<VerdictVersionView> {
  return api.post<VerdictVersionView>(
    `/claims/${encodeURIComponent(claimId)}/verdict/versions`,
    body,
  );
}

export function useStartDraft(claimId: string) {
  return useVerdictMutation(claimId, () => startDraft(claimId));
}
