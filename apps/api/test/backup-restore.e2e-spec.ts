import { backup, restore, tableFingerprints } from '@skyledger/devstack/backup';
import { TestDatabase } from '@skyledger/devstack/test-database';
import { createHash } from 'node:crypto';
import { mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { DeskFlow } from './support/desk-flow';
import { onePixelPng, tinyPdf } from './support/evidence-files';
import { createTestApp, type TestApp } from './support/test-app';

const tmpRoot = join(__dirname, '../../../tmp');

async function storedFileHashes(root: string): Promise<Record<string, string>> {
  const entries = await readdir(root, { recursive: true, withFileTypes: true });
  const hashes: Record<string, string> = {};
  for (const entry of entries.filter((e) => e.isFile())) {
    const path = join(entry.parentPath, entry.name);
    if (path.includes('.incoming')) continue;
    hashes[path.slice(root.length + 1)] = createHash('sha256')
      .update(await readFile(path))
      .digest('hex');
  }
  return hashes;
}

describe('backup and restore of the database and the stored files', () => {
  let t: TestApp;
  let target: TestDatabase;
  let work: string;

  beforeAll(async () => {
    t = await createTestApp('backup', {
      PUBLISHER_ENABLED: 'false',
      OUTBOX_WORKER_ENABLED: 'false',
    });
    const desk = await DeskFlow.start(t, 'backup.test');
    const claim = await desk.clearedClaim('Backups keep every row of a published check');
    for (const [bytes, name] of [
      [onePixelPng, 'capture.png'],
      [tinyPdf, 'minutes.pdf'],
    ] as const) {
      await t
        .http()
        .post(`/api/claims/${claim.id}/attachments`)
        .set(desk.as('editor'))
        .attach('file', bytes, name)
        .expect(201);
    }
    await desk.publishNow(claim.id);
    target = new TestDatabase('restored');
    work = await mkdtemp(join(tmpRoot, 'backup-test-'));
  });
  afterAll(async () => {
    await t.close();
    await target.drop().catch(() => undefined);
    await rm(work, { recursive: true, force: true });
  });

  it('restores into a fresh database with every table’s rows and checksum and every file’s SHA-256 equal', async () => {
    const access = {
      DB_HOST: process.env.DB_HOST!,
      DB_PORT: process.env.DB_PORT!,
      DB_USER: process.env.DB_USER!,
      DB_PASSWORD: process.env.DB_PASSWORD!,
    };
    const archive = join(work, 'desk.tar.gz');
    const source = process.env.DB_NAME!;
    const manifest = await backup({ access, database: source, filesDir: t.filesDir, archive });
    expect(Object.keys(manifest.tables)).toEqual(
      expect.arrayContaining([
        'claims',
        'publications',
        'verdict_versions',
        'attachments',
        'audit_events',
      ]),
    );
    expect(manifest.tables.claims!.rows).toBe(1);
    expect(Object.keys(manifest.files)).toHaveLength(2);

    const restoredFiles = join(work, 'files');
    await restore({ access, database: target.name, filesDir: restoredFiles, archive });
    expect(await tableFingerprints(access, target.name)).toEqual(
      await tableFingerprints(access, source),
    );
    expect(await storedFileHashes(restoredFiles)).toEqual(await storedFileHashes(t.filesDir));
    for (const [path, sha] of Object.entries(await storedFileHashes(restoredFiles))) {
      // Content-addressed: each file's name is its own SHA-256.
      expect(path.endsWith(sha)).toBe(true);
    }
  });

  it('refuses a restore whose files do not match the backup, naming the file', async () => {
    const access = {
      DB_HOST: process.env.DB_HOST!,
      DB_PORT: process.env.DB_PORT!,
      DB_USER: process.env.DB_USER!,
      DB_PASSWORD: process.env.DB_PASSWORD!,
    };
    const archive = join(work, 'tampered.tar.gz');
    await backup({ access, database: process.env.DB_NAME!, filesDir: t.filesDir, archive });
    // Tamper with the archive: unpack, change a stored file, pack again.
    const unpacked = await mkdtemp(join(work, 'unpacked-'));
    const { spawnSync } = await import('node:child_process');
    spawnSync('tar', ['-xzf', archive, '-C', unpacked]);
    const [first] = Object.keys(
      JSON.parse(await readFile(join(unpacked, 'manifest.json'), 'utf8')).files as object,
    );
    await writeFile(join(unpacked, 'files', first!), 'not the original bytes');
    spawnSync('tar', ['-czf', archive, '-C', unpacked, '.']);
    await expect(
      restore({ access, database: target.name, filesDir: join(work, 'files-2'), archive }),
    ).rejects.toThrow(`file ${first}: SHA-256 differs`);
  });
});
