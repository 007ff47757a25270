import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { access, copyFile, mkdir, rename, rm } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import { type Readable } from 'node:stream';
import { StoredFileMissingError, type FileStorage } from './file-storage';

/** Files on the local disk under one directory (by default the repository's ignored `.data/files`). */
export class LocalFileStorage implements FileStorage {
  private readonly root: string;

  constructor(root: string) {
    this.root = resolve(root);
  }

  async has(key: string): Promise<boolean> {
    try {
      await access(this.pathOf(key));
      return true;
    } catch {
      return false;
    }
  }

  async putFile(key: string, path: string): Promise<void> {
    const target = this.pathOf(key);
    await mkdir(dirname(target), { recursive: true });
    // Copy beside the target, then rename: a reader never sees half a file.
    const partial = `${target}.${randomUUID()}.partial`;
    try {
      await copyFile(path, partial);
      await rename(partial, target);
    } finally {
      await rm(partial, { force: true });
    }
  }

  async open(key: string): Promise<Readable> {
    const path = this.pathOf(key);
    if (!(await this.has(key))) throw new StoredFileMissingError(key);
    return createReadStream(path);
  }

  private pathOf(key: string): string {
    const path = resolve(join(this.root, key));
    if (!path.startsWith(this.root + sep)) throw new Error(`Storage key outside the store: ${key}`);
    return path;
  }
}
