import { randomBytes } from 'node:crypto';

/**
 * A multipart/form-data body with one file part, its `Content-Disposition` written byte for
 * byte as given. supertest's `.attach()` (form-data) cuts a name down to its base name before
 * sending it, so it cannot send the names a hostile client would; this can.
 *
 * `disposition` is everything after `form-data; name="file"; `, e.g. `filename="../../x"` or
 * `filename*=UTF-8''%2E%2E%2Fx` (RFC 7578, section 4.2).
 */
export function rawMultipart(
  bytes: Buffer,
  disposition: string,
): { contentType: string; body: Buffer } {
  const boundary = `----skyledger${randomBytes(12).toString('hex')}`;
  const head =
    `--${boundary}\r\n` +
    `Content-Disposition: form-data; name="file"; ${disposition}\r\n` +
    'Content-Type: application/octet-stream\r\n\r\n';
  return {
    contentType: `multipart/form-data; boundary=${boundary}`,
    body: Buffer.concat([
      Buffer.from(head, 'utf8'),
      bytes,
      Buffer.from(`\r\n--${boundary}--\r\n`, 'utf8'),
    ]),
  };
}

/** A quoted `filename="..."` parameter holding the name's UTF-8 bytes as they are. */
export const quotedFilename = (name: string) => `filename="${name}"`;

/** An RFC 8187 `filename*` parameter: any character, percent-encoded. */
export const extendedFilename = (name: string) =>
  `filename*=UTF-8''${encodeURIComponent(name).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)}`;
