import type { ClaimDetail, CreateClaimRequest } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { attachCapture } from './attach-capture';
import { claimKeys } from './claim-keys';
import { fileClaim } from './file-claim';

export type FilingStage = 'filing' | 'uploading' | 'attaching';

export interface FileClaimInput {
  body: CreateClaimRequest;
  /** The archived capture of the first appearance, uploaded once the claim exists. */
  capture: File | null;
  onStage?: (stage: FilingStage) => void;
  /** How much of the capture has gone up, from 0 to 1. */
  onProgress?: (fraction: number) => void;
}

export interface FiledClaim {
  claim: ClaimDetail;
  /** Why the capture did not get attached; the claim itself is filed either way. */
  captureError: unknown;
}

/**
 * Files a claim, then uploads its capture and makes it the first appearance's capture
 * (`PATCH …/appearances/:id { captureAttachmentId, version }`). A failed upload leaves
 * the claim filed and is reported, not thrown: filing again would make a duplicate.
 */
export async function fileClaimWithCapture({
  body,
  capture,
  onStage,
  onProgress,
}: FileClaimInput): Promise<FiledClaim> {
  onStage?.('filing');
  const claim = await fileClaim(body);
  const appearance = claim.appearances[0];
  if (!capture || !appearance) return { claim, captureError: null };
  try {
    onStage?.('uploading');
    await attachCapture(claim.id, {
      appearance,
      file: capture,
      onUploaded: () => onStage?.('attaching'),
      onProgress,
    });
    return { claim, captureError: null };
  } catch (captureError) {
    return { claim, captureError };
  }
}

export function useFileClaim() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fileClaimWithCapture,
    onSuccess: ({ claim }) => {
      // The answer to the filing predates the capture: the claim page reads it afresh.
      queryClient.removeQueries({ queryKey: claimKeys.detail(claim.id) });
      return queryClient.invalidateQueries({ queryKey: claimKeys.lists() });
    },
  });
}
