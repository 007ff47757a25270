import type { AttachmentView } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

/** Sends one evidence file as multipart, its only field named `file`; the API sniffs its type. */
export function uploadAttachment(
  claimId: string,
  file: File,
  onProgress?: (fraction: number) => void,
): Promise<AttachmentView> {
  const form = new FormData();
  form.set('file', file, file.name);
  return api.post<AttachmentView>(`/claims/${encodeURIComponent(claimId)}/attachments`, form, {
    onUploadProgress: onProgress,
  });
}

export interface UploadInput {
  file: File;
  /** How much of the file has gone up, from 0 to 1. */
  onProgress?: (fraction: number) => void;
}

export function useUploadAttachment(claimId: string) {
  return useClaimMutation(claimId, ({ file, onProgress }: UploadInput) =>
    uploadAttachment(claimId, file, onProgress),
  );
}
