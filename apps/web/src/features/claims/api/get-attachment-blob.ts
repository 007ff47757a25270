import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { claimKeys } from './claim-keys';

/** The bytes of an evidence file; the API wants the bearer token, so an <img src> cannot. */
export function getAttachmentBlob(id: string): Promise<Blob> {
  return api.blob(`/attachments/${encodeURIComponent(id)}`);
}

export const attachmentBlobQueryOptions = (id: string) =>
  queryOptions({
    queryKey: claimKeys.attachment(id),
    queryFn: () => getAttachmentBlob(id),
    // Stored files never change: the same id always holds the same bytes.
    staleTime: Infinity,
  });

export function useAttachmentBlob(id: string, enabled = true) {
  return useQuery({ ...attachmentBlobQueryOptions(id), enabled });
}
