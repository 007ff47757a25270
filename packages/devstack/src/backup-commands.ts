import { join, resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { backup, restore } from './backup.js';
import { databaseEnv, start } from './mariadb.js';
import { dataDir } from './paths.js';

const stamp = () =>
  new Date().toISOString().replace(/[-:]/g, '').replace(/\..*/, '').replace('T', '-');

/** `npm run db:backup [-- --out FILE]`: the demo desk's database and stored files. */
export async function backupCommand(args: string[]): Promise<number> {
  const { values } = parseArgs({ args, options: { out: { type: 'string' } } });
  await start();
  const env = databaseEnv();
  const archive = resolve(values.out ?? join(dataDir, 'backups', `skyledger-${stamp()}.tar.gz`));
  const manifest = await backup({
    access: env,
    database: env.DB_NAME,
    filesDir: join(dataDir, 'files'),
    archive,
  });
  console.info(
    `Backed up ${Object.keys(manifest.tables).length} tables and ${Object.keys(manifest.files).length} stored files to ${archive}`,
  );
  return 0;
}

/** `npm run db:restore -- FILE`: replaces the demo desk's database and files with a backup. */
export async function restoreCommand(args: string[]): Promise<number> {
  const [file] = parseArgs({ args, allowPositionals: true }).positionals;
  if (!file) {
    console.error('Usage: npm run db:restore -- <backup .tar.gz>  (stop the API first)');
    return 2;
  }
  await start();
  const env = databaseEnv();
  const manifest = await restore({
    access: env,
    database: env.DB_NAME,
    filesDir: join(dataDir, 'files'),
    archive: resolve(file),
  });
  console.info(
    `Restored ${Object.keys(manifest.tables).length} tables and ${Object.keys(manifest.files).length} files from the backup of ${manifest.createdAt}; every row count, checksum and SHA-256 matches.`,
  );
  return 0;
}
