import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { type Readable } from 'node:stream';
import { text } from 'node:stream/consumers';
import { startFakeS3, type FakeS3 } from '../../test/support/fake-s3';
import { contentKey, StoredFileMissingError, type FileStorage } from './file-storage';
import { LocalFileStorage } from './local-file-storage';
import { S3FileStorage } from './s3-file-storage';

const tmpRoot = join(__dirname, '../../../../tmp');
const key = contentKey('ab'.repeat(32));

describe.each([
  [
    'local disk',
    async () => {
      const root = await mkdtemp(join(tmpRoot, 'local-store-'));
      return {
        storage: new LocalFileStorage(root) as FileStorage,
        stop: () => rm(root, { recursive: true, force: true }),
      };
    },
  ],
  [
    'S3 (s3rver)',
    async () => {
      const s3: FakeS3 = await startFakeS3();
      const storage = new S3FileStorage({
        bucket: s3.bucket,
        region: 'us-east-1',
        endpoint: s3.endpoint,
        forcePathStyle: true,
        credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
        prefix: 'evidence/',
      });
      return { storage: storage as FileStorage, stop: () => s3.stop() };
    },
  ],
])('file storage on %s', (_name, open) => {
  let storage: FileStorage;
  let stop: () => Promise<unknown>;
  let scratch: string;

  beforeAll(async () => {
    ({ storage, stop } = await open());
    scratch = await mkdtemp(join(tmpRoot, 'store-input-'));
  });
  afterAll(async () => {
    await stop();
    await rm(scratch, { recursive: true, force: true });
  });

  it('stores a file under its key and gives the same bytes back', async () => {
    expect(await storage.has(key)).toBe(false);
    const path = join(scratch, 'notes.txt');
    await writeFile(path, 'Seen on the harbour notice board.');
    await storage.putFile(key, path, 'text/plain');
    expect(await storage.has(key)).toBe(true);
    expect(await text((await storage.open(key)) as Readable)).toBe(
      'Seen on the harbour notice board.',
    );
  });

  it('says plainly when nothing is stored under a key', async () => {
    const missing = contentKey('cd'.repeat(32));
    expect(await storage.has(missing)).toBe(false);
    await expect(storage.open(missing)).rejects.toBeInstanceOf(StoredFileMissingError);
  });
});

describe('contentKey', () => {
  it('fans out by the first two hex digits and refuses anything but a SHA-256', () => {
    expect(contentKey('0f'.repeat(32))).toBe(`sha256/0f/${'0f'.repeat(32)}`);
    expect(() => contentKey('../../etc/passwd')).toThrow('Not a SHA-256');
  });
});

describe('LocalFileStorage', () => {
  it('refuses keys that would leave its folder', async () => {
    const storage = new LocalFileStorage(join(tmpRoot, 'never-created'));
    await expect(storage.putFile('../outside', '/dev/null')).rejects.toThrow('outside the store');
  });
});
