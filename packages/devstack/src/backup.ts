import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { createReadStream, createWriteStream, existsSync } from 'node:fs';
import { cp, mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { dirname, join, relative } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { type RowDataPacket } from 'mysql2';
import { createConnection } from 'mysql2/promise';
import { tmpDir } from './paths.js';
import { StepFailedError } from './processes.js';
import { type DatabaseAccess } from './test-database.js';

/** What a backup holds, written into it and checked again on restore. */
export interface BackupManifest {
  database: string;
  createdAt: string;
  /** Row count and CHECKSUM TABLE of every table when the snapshot was taken. */
  tables: Record<string, { rows: number; checksum: string }>;
  /** SHA-256 of every stored file, by its path under the files folder. */
  files: Record<string, string>;
}

const clientArgs = (access: DatabaseAccess) => [
  '--no-defaults',
  `--host=${access.DB_HOST}`,
  `--port=${access.DB_PORT}`,
  `--user=${access.DB_USER}`,
];
// The password goes in the environment, never on a command line other users can read.
const clientEnv = (access: DatabaseAccess) => ({ ...process.env, MYSQL_PWD: access.DB_PASSWORD });

async function sha256Of(path: string): Promise<string> {
  const hash = createHash('sha256');
  await pipeline(createReadStream(path), hash);
  return hash.digest('hex');
}

async function filesUnder(root: string): Promise<string[]> {
  if (!existsSync(root)) return [];
  const entries = await readdir(root, { recursive: true, withFileTypes: true });
  return entries
    .filter((entry) => entry.isFile())
    .map((entry) => relative(root, join(entry.parentPath, entry.name)))
    .filter((path) => !path.startsWith('.incoming'))
    .sort();
}

/** Row counts and checksums of every table of a database, as the manifest records them. */
export async function tableFingerprints(
  access: DatabaseAccess,
  database: string,
): Promise<BackupManifest['tables']> {
  const connection = await createConnection({
    host: access.DB_HOST,
    port: Number(access.DB_PORT),
    user: access.DB_USER,
    password: access.DB_PASSWORD,
    database,
  });
  try {
    const [tables] = await connection.query<Array<{ name: string } & RowDataPacket>>(
      "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = ? AND table_type = 'BASE TABLE' ORDER BY table_name",
      [database],
    );
    const result: BackupManifest['tables'] = {};
    for (const { name } of tables) {
      const [[count]] = await connection.query<Array<{ rows: number } & RowDataPacket>>(
        `SELECT COUNT(*) AS \`rows\` FROM \`${name}\``,
      );
      const [[checksum]] = await connection.query<Array<{ Checksum: string } & RowDataPacket>>(
        `CHECKSUM TABLE \`${name}\``,
      );
      result[name] = { rows: Number(count!.rows), checksum: String(checksum!.Checksum) };
    }
    return result;
  } finally {
    await connection.end();
  }
}

/**
 * A consistent backup of one database and the stored files, as a .tar.gz: the SQL dump is
 * taken in one transaction (`--single-transaction`, so writes may go on meanwhile) and the
 * manifest records every table's rows and checksum and every file's SHA-256.
 */
export async function backup(options: {
  access: DatabaseAccess;
  database: string;
  filesDir: string;
  archive: string;
}): Promise<BackupManifest> {
  await mkdir(tmpDir, { recursive: true });
  const work = await mkdtemp(join(tmpDir, 'backup-'));
  try {
    const dump = createWriteStream(join(work, 'database.sql'));
    const child = spawn(
      'mariadb-dump',
      [
        ...clientArgs(options.access),
        '--single-transaction',
        '--quick',
        '--routines',
        '--triggers',
        '--hex-blob',
        '--no-tablespaces',
        options.database,
      ],
      { env: clientEnv(options.access), stdio: ['ignore', 'pipe', 'pipe'] },
    );
    let stderr = '';
    child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    const exited = new Promise<number | null>((resolve) => child.on('close', resolve));
    await pipeline(child.stdout, dump);
    if ((await exited) !== 0) throw new StepFailedError(`mariadb-dump failed: ${stderr.trim()}`);

    const files: BackupManifest['files'] = {};
    for (const path of await filesUnder(options.filesDir)) {
      files[path] = await sha256Of(join(options.filesDir, path));
      await mkdir(dirname(join(work, 'files', path)), { recursive: true });
      await cp(join(options.filesDir, path), join(work, 'files', path));
    }
    const manifest: BackupManifest = {
      database: options.database,
      createdAt: new Date().toISOString(),
      tables: await tableFingerprints(options.access, options.database),
      files,
    };
    await writeFile(join(work, 'manifest.json'), JSON.stringify(manifest, null, 2));
    await mkdir(dirname(options.archive), { recursive: true });
    const tar = spawnSync('tar', ['-czf', options.archive, '-C', work, '.'], { encoding: 'utf8' });
    if (tar.status !== 0) throw new StepFailedError(`tar failed: ${tar.stderr}`);
    return manifest;
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

/**
 * Restores a backup into `database` (dropped first if it exists) and the files into
 * `filesDir`, then checks everything against the manifest: every table's rows and
 * checksum, every file's SHA-256. Throws, naming what differs, if anything does.
 */
export async function restore(options: {
  access: DatabaseAccess;
  database: string;
  filesDir: string;
  archive: string;
}): Promise<BackupManifest> {
  await mkdir(tmpDir, { recursive: true });
  const work = await mkdtemp(join(tmpDir, 'restore-'));
  try {
    const tar = spawnSync('tar', ['-xzf', options.archive, '-C', work], { encoding: 'utf8' });
    if (tar.status !== 0) throw new StepFailedError(`tar failed: ${tar.stderr}`);
    const manifest = JSON.parse(
      await readFile(join(work, 'manifest.json'), 'utf8'),
    ) as BackupManifest;
    const sql = (statement: string) => {
      const result = spawnSync('mariadb', [...clientArgs(options.access), '--batch'], {
        input: statement,
        env: clientEnv(options.access),
        encoding: 'utf8',
      });
      if (result.status !== 0) throw new StepFailedError(`SQL failed: ${result.stderr.trim()}`);
    };
    sql(
      `DROP DATABASE IF EXISTS \`${options.database}\`; CREATE DATABASE \`${options.database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    );
    const load = spawn('mariadb', [...clientArgs(options.access), options.database], {
      env: clientEnv(options.access),
      stdio: ['pipe', 'ignore', 'pipe'],
    });
    let stderr = '';
    load.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    const exited = new Promise<number | null>((resolve) => load.on('close', resolve));
    await pipeline(createReadStream(join(work, 'database.sql')), load.stdin);
    if ((await exited) !== 0)
      throw new StepFailedError(`loading the dump failed: ${stderr.trim()}`);

    const problems: string[] = [];
    for (const [path, sha256] of Object.entries(manifest.files)) {
      const target = join(options.filesDir, path);
      await mkdir(dirname(target), { recursive: true });
      await cp(join(work, 'files', path), target);
      if ((await sha256Of(target)) !== sha256) problems.push(`file ${path}: SHA-256 differs`);
    }
    const restored = await tableFingerprints(options.access, options.database);
    for (const [table, expected] of Object.entries(manifest.tables)) {
      const actual = restored[table];
      if (!actual) problems.push(`table ${table}: missing`);
      else if (actual.rows !== expected.rows)
        problems.push(`table ${table}: ${actual.rows} rows, expected ${expected.rows}`);
      else if (actual.checksum !== expected.checksum)
        problems.push(`table ${table}: checksum differs`);
    }
    if (problems.length)
      throw new StepFailedError(
        `The restore does not match the backup:\n  ${problems.join('\n  ')}`,
      );
    return manifest;
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}
