import { StreamableFile } from '@nestjs/common';
import { inlineMediaTypes, type AttachmentMediaType } from '@skyledger/contracts';
import { create as contentDisposition } from 'content-disposition';
import { type Response } from 'express';
import { type Readable } from 'node:stream';
import { type Attachment } from './entities/attachment.entity';

/**
 * The policy a stored file is served under, whoever opens it: nothing may load and, as a
 * sandbox, the file is its own opaque origin where no script runs. Images and PDFs still
 * show (Chromium's viewer runs outside the page); a file that somehow held markup could do
 * nothing with the desk's origin.
 */
export const storedFilePolicy = "default-src 'none'; style-src 'unsafe-inline'; sandbox";

/**
 * The bytes of a stored file with the headers every download carries: its sniffed type
 * (helmet adds `X-Content-Type-Options: nosniff`), the name as RFC 6266 and RFC 8187 spell
 * it (`filename*`), inline for images and PDFs only, and the sandboxing policy.
 */
export function storedFileResponse(
  res: Response,
  attachment: Pick<Attachment, 'mediaType' | 'size' | 'originalName'>,
  bytes: Readable,
): StreamableFile {
  const inline = inlineMediaTypes.includes(attachment.mediaType as AttachmentMediaType);
  res.setHeader('Content-Security-Policy', storedFilePolicy);
  return new StreamableFile(bytes, {
    type: attachment.mediaType,
    length: attachment.size,
    disposition: contentDisposition(attachment.originalName, {
      type: inline ? 'inline' : 'attachment',
    }),
  });
}
