import { createHash, randomBytes } from 'node:crypto';

/** A random token for a link or a cookie: 256 bits, URL-safe. */
export function randomToken(): string {
  return randomBytes(32).toString('base64url');
}

/** Tokens are stored only as their SHA-256, so a leaked table opens no account. */
export function sha256Hex(value: string): string {
  return createHash('sha256').update(value).digest('hex');
}
