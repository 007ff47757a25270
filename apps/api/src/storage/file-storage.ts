import { type Readable } from 'node:stream';

/** Where evidence bytes live. One implementation per backend, chosen by configuration. */
export interface FileStorage {
  /** Whether something is stored under `key`. */
  has(key: string): Promise<boolean>;
  /** Stores the file at `path` under `key`, replacing nothing half-written if it fails. */
  putFile(key: string, path: string, mediaType: string): Promise<void>;
  /** The stored bytes; throws `StoredFileMissingError` when nothing is under `key`. */
  open(key: string): Promise<Readable>;
}

export const FILE_STORAGE = Symbol('FILE_STORAGE');

export class StoredFileMissingError extends Error {
  constructor(key: string) {
    super(`Nothing is stored under ${key}`);
  }
}

/**
 * Content addressing: the key is the SHA-256 of the bytes, fanned out by its first two
 * hex digits so no folder grows too large. The same bytes always get the same key.
 */
export function contentKey(sha256: string): string {
  if (!/^[0-9a-f]{64}$/.test(sha256)) throw new Error(`Not a SHA-256 in hex: ${sha256}`);
  return `sha256/${sha256.slice(0, 2)}/${sha256}`;
}
