import type { AttachmentView } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

/** Sends one evidence file as multipart, its only field named `file`; the API sniffs its type. */
export function uploadAttachment(claimId: string, file: File): Promise<AttachmentView> {
  const form = new FormData();
  form.set('file', file, file.name);
  return api.post<AttachmentView>(`/claims/${encodeURIComponent(claimId)}/attachments`, form);
}

export function useUploadAttachment(claimId: string) {
  return useClaimMutation(claimId, (file: File) => uploadAttachment(claimId, file));
}
