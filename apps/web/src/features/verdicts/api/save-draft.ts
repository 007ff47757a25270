import type { UpdateVerdictVersionRequest, VerdictVersionView } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useVerdictMutation } from './use-verdict-mutation';

export type SaveDraftInput = UpdateVerdictVersionRequest & { versionId: string };

/** Saves a draft with the version the editor started from; a stale one is answered 409. */
export function saveDraft(
  claimId: string,
  { versionId, ...body }: SaveDraftInput,
): Promise<VerdictVersionView> {
  return api.patch<VerdictVersionView>(
    `/claims/${encodeURIComponent(claimId)}/verdict/versions/${encodeURIComponent(versionId)}`,
    body,
  );
}

export function useSaveDraft(claimId: string) {
  return useVerdictMutation(claimId, (input: SaveDraftInput) => saveDraft(claimId, input));
}
