import { createHash, randomUUID } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { mkdir, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { Transform, type Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { type StorageConfig } from '../config/configuration';

/** An upload received in full into the staging folder, with what was learnt on the way. */
/** Where uploads wait while they are received and checked, beside the local store. */
export function stagingDirectory(config: StorageConfig): string {
  return join(config.directory, '.incoming');
}

export interface StagedUpload {
  path: string;
  size: number;
  sha256: string;
  originalName: string;
}

export class UploadTooLargeError extends Error {
  constructor(readonly limit: number) {
    super(`The upload is larger than ${limit} bytes`);
  }
}

/**
 * Writes a stream to a new file in `directory`, computing its SHA-256 and size as the
 * bytes pass, and stops with `UploadTooLargeError` (leaving no file) past `maxBytes`.
 */
export async function stageStream(
  source: Readable,
  options: { directory: string; maxBytes: number; originalName: string },
): Promise<StagedUpload> {
  await mkdir(options.directory, { recursive: true });
  const path = join(options.directory, `${randomUUID()}.upload`);
  const hash = createHash('sha256');
  let size = 0;
  const measure = new Transform({
    transform(chunk: Buffer, _encoding, callback) {
      size += chunk.length;
      if (size > options.maxBytes) return callback(new UploadTooLargeError(options.maxBytes));
      hash.update(chunk);
      callback(null, chunk);
    },
  });
  try {
    await pipeline(source, measure, createWriteStream(path, { flags: 'wx' }));
  } catch (error) {
    await rm(path, { force: true });
    throw error;
  }
  return { path, size, sha256: hash.digest('hex'), originalName: options.originalName };
}

export function discardStaged(upload: Pick<StagedUpload, 'path'>): Promise<void> {
  return rm(upload.path, { force: true });
}
