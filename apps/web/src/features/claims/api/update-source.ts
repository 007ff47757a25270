import type { SourceView, UpdateSourceRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export interface UpdateSourceInput extends UpdateSourceRequest {
  sourceId: string;
}

/** Edits a source (e.g. its grade) wherever it is cited; `PATCH /api/sources/:id`. */
export function updateSource({ sourceId, ...body }: UpdateSourceInput): Promise<SourceView> {
  return api.patch<SourceView>(`/sources/${encodeURIComponent(sourceId)}`, body);
}

/** From a claim's page: the claim (and the queue) reload after the change. */
export function useUpdateSource(claimId: string) {
  return useClaimMutation(claimId, updateSource);
}
