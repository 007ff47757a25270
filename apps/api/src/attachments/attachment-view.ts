import { type AttachmentMediaType, type AttachmentView } from '@skyledger/contracts';
import { toPersonRef } from '../common/views/person-ref';
import { type Attachment } from './entities/attachment.entity';

/** Needs `uploadedBy` loaded. */
export function toAttachmentView(attachment: Attachment): AttachmentView {
  return {
    id: attachment.id,
    originalName: attachment.originalName,
    mediaType: attachment.mediaType as AttachmentMediaType,
    size: attachment.size,
    sha256: attachment.sha256,
    uploadedBy: toPersonRef(attachment.uploadedBy),
    uploadedAt: attachment.uploadedAt.toISOString(),
  };
}
