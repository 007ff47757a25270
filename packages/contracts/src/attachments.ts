import { type PersonRef } from './common.js';

/** What the desk accepts as evidence files; the type is read from the bytes, never the name. */
export const attachmentMediaTypes = [
  'application/pdf',
  'image/png',
  'image/jpeg',
  'image/webp',
  'text/csv',
  'text/plain',
] as const;
export type AttachmentMediaType = (typeof attachmentMediaTypes)[number];

/** Shown inline in the browser; everything else downloads. */
export const inlineMediaTypes: readonly AttachmentMediaType[] = [
  'application/pdf',
  'image/png',
  'image/jpeg',
  'image/webp',
];

export interface AttachmentView {
  id: string;
  originalName: string;
  mediaType: AttachmentMediaType;
  size: number;
  sha256: string;
  uploadedBy: PersonRef;
  uploadedAt: string;
}
