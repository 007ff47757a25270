import type { AttachmentView } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export interface UploadAttachmentInput {
  file: File;
  /** Makes the file that appearance's archived capture. */
  appearanceId?: string;
}

export function uploadAttachment(
  claimId: string,
  { file, appearanceId }: UploadAttachmentInput,
): Promise<AttachmentView> {
  const form = new FormData();
  if (appearanceId) form.set('appearanceId', appearanceId);
  form.set('file', file, file.name);
  return api.post<AttachmentView>(`/claims/${encodeURIComponent(claimId)}/attachments`, form);
}

export function useUploadAttachment(claimId: string) {
  return useClaimMutation(claimId, (input: UploadAttachmentInput) =>
    uploadAttachment(claimId, input),
  );
}
