import { attachmentMediaTypes } from '@skyledger/contracts';

/** What the file picker offers: the accepted media types and their usual name endings. */
export const evidenceFileAccept = [
  ...attachmentMediaTypes,
  '.pdf',
  '.png',
  '.jpg',
  '.jpeg',
  '.webp',
  '.csv',
  '.txt',
].join(',');

export const evidenceFileHint = 'PDF, PNG, JPEG, WebP, CSV or plain text';

/**
 * A first look at a chosen file, by its reported type or its name, so an obvious mistake is
 * caught before anything is sent. The API reads the bytes and has the last word.
 */
export function looksLikeEvidenceFile(file: File): boolean {
  if ((attachmentMediaTypes as readonly string[]).includes(file.type)) return true;
  return /\.(pdf|png|jpe?g|webp|csv|txt)$/i.test(file.name);
}
