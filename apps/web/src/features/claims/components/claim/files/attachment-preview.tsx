import { Skeleton, Text } from '@radix-ui/themes';
import type { AttachmentView } from '@skyledger/contracts';
import { errorMessage } from '@/lib/api-error-messages';
import { useAttachmentBlob } from '../../../api/get-attachment-blob';
import { BlobFrame, BlobImage } from './blob-view';

export type PreviewKind = 'image' | 'pdf';

export function previewKind(mediaType: AttachmentView['mediaType']): PreviewKind | null {
  if (mediaType === 'application/pdf') return 'pdf';
  return mediaType.startsWith('image/') ? 'image' : null;
}

/** An image or PDF evidence file shown in the page, its bytes fetched with the token. */
export function AttachmentPreview({ attachment }: { attachment: AttachmentView }) {
  const kind = previewKind(attachment.mediaType);
  const file = useAttachmentBlob(attachment.id, kind !== null);
  if (!kind) return null;
  if (file.isPending) {
    return (
      <Skeleton className={kind === 'pdf' ? 'sl-preview-frame' : 'sl-preview-image'}>
        Loading the preview of {attachment.originalName}…
      </Skeleton>
    );
  }
  if (file.isError) {
    return (
      <Text size="2" color="red">
        The preview could not load: {errorMessage(file.error)}
      </Text>
    );
  }
  return kind === 'image' ? (
    <BlobImage blob={file.data} alt={`Preview of ${attachment.originalName}`} />
  ) : (
    <BlobFrame blob={file.data} title={`Preview of ${attachment.originalName}`} />
  );
}
