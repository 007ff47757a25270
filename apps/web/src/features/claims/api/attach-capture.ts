import type { AppearanceView } from '@skyledger/contracts';
import { updateAppearance } from './update-appearance';
import { uploadAttachment } from './upload-attachment';
import { useClaimMutation } from './use-claim-mutation';

export interface AttachCaptureInput {
  appearance: Pick<AppearanceView, 'id' | 'version'>;
  file: File;
  /** Told when the bytes are up and the appearance is being pointed at them. */
  onUploaded?: () => void;
  /** How much of the file has gone up, from 0 to 1. */
  onProgress?: (fraction: number) => void;
}

/** Uploads a capture to the claim, then makes it the appearance's archived capture. */
export async function attachCapture(
  claimId: string,
  { appearance, file, onUploaded, onProgress }: AttachCaptureInput,
): Promise<AppearanceView> {
  const attachment = await uploadAttachment(claimId, file, onProgress);
  onUploaded?.();
  return updateAppearance(claimId, {
    appearanceId: appearance.id,
    captureAttachmentId: attachment.id,
    version: appearance.version,
  });
}

export function useAttachCapture(claimId: string) {
  return useClaimMutation(claimId, (input: AttachCaptureInput) => attachCapture(claimId, input));
}
