import { type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { cpSync, existsSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { createPool, type Pool, type RowDataPacket } from 'mysql2/promise';
import { apiDir, migrationArgs, startApi } from '../api-server.js';
import { appEnv } from '../app-env.js';
import { freePort } from '../free-port.js';
import { database } from '../mariadb.js';
import { repoRoot, tmpDir } from '../paths.js';
import { runQuiet, stopService } from '../processes.js';
import { databaseAccess, TestDatabase } from '../test-database.js';
import { type BenchPlan } from './plan.js';
import { createFulltextIndex } from './sql-reference.js';

const tsx = join(repoRoot, 'node_modules/tsx/dist/cli.mjs');
const BENCH_EMAIL = 'bench-chief@bench.skyledger.test';

/** Claims and explainers the measured requests go through in turn. */
export interface Samples {
  /** Published claims, with sources and verdicts: the claim pages read. */
  claimIds: string[];
  /** Claims in research: the ones workings are saved on. */
  researchIds: string[];
  slugs: string[];
}

/** What to undo at the end, newest first: also run on Ctrl-C, whatever was reached. */
export class Cleanups {
  private readonly steps: Array<() => Promise<unknown>> = [];
  private done: Promise<void> | undefined;

  add(step: () => Promise<unknown>): void {
    this.steps.push(step);
  }

  run(): Promise<void> {
    return (this.done ??= (async () => {
      for (const step of this.steps.reverse()) await step().catch(() => undefined);
    })());
  }
}

export interface BenchStack {
  baseUrl: string;
  headers: Record<string, string>;
  /** The benchmark database, for the SQL references and for looking rows up. */
  pool: Pool;
  api: ChildProcess;
  /** The folder the API serves as WEB_DIST_DIR: the built desk and the static references. */
  webDir: string;
  samples: Samples;
  dataset: Record<string, number>;
  /** Spawn to health, and to the first search answered, in seconds. */
  coldStart: { health: number; firstSearch: number };
}

async function rowsOf<T>(pool: Pool, sql: string): Promise<T[]> {
  const [rows] = await pool.query<RowDataPacket[]>(sql);
  return rows as T[];
}

/** The built API's start from scratch, timed until it answers its first search. */
async function coldStart(env: Record<string, string>, port: number, password: string) {
  const baseUrl = `http://127.0.0.1:${port}`;
  const started = performance.now();
  const api = await startApi(env, port, true);
  const health = (performance.now() - started) / 1000;
  const signIn = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: BENCH_EMAIL, password }),
  });
  if (!signIn.ok) throw new Error(`The benchmark's sign-in failed (${signIn.status})`);
  const { accessToken } = (await signIn.json()) as { accessToken: string };
  const headers = { authorization: `Bearer ${accessToken}` };
  const search = await fetch(`${baseUrl}/api/search?q=warming`, { headers });
  if (!search.ok) throw new Error(`The first search failed (${search.status})`);
  const firstSearch = (performance.now() - started) / 1000;
  return { api, baseUrl, headers, coldStart: { health, firstSearch } };
}

/**
 * A database of the benchmark's own on the private MariaDB (`skyledger_bench_…`, dropped
 * at the end), migrated and filled by the seeds-demo generator, with the FULLTEXT index
 * the SQL reference needs; then the built API on a free port, silent, serving a copy of
 * the built desk to which the static references are added.
 */
export async function startBenchStack(plan: BenchPlan, cleanups: Cleanups): Promise<BenchStack> {
  const db = new TestDatabase(plan.mode, databaseAccess(), database.benchPrefix);
  const webDir = join(tmpDir, `web-${db.name}`);
  const filesDir = join(tmpDir, `files-${db.name}`);
  cleanups.add(() => db.drop());
  cleanups.add(async () => rmSync(webDir, { recursive: true, force: true }));
  cleanups.add(async () => rmSync(filesDir, { recursive: true, force: true }));
  await db.create();
  const port = await freePort();
  const env = {
    ...appEnv({ port, smtpPort: await freePort(), databaseName: db.name }),
    ...db.access,
    DB_NAME: db.name,
    LOG_LEVEL: 'silent',
    // Nothing is mailed, and a benchmark's token must outlast the run.
    OUTBOX_WORKER_ENABLED: 'false',
    JWT_ACCESS_TTL_SECONDS: '86400',
    AUTH_RATE_LIMIT_PER_MINUTE: '100000',
    WEB_DIST_DIR: webDir,
    FILES_DIR: filesDir,
  };
  console.info(`\n▸ Benchmark database ${db.name}: migrations`);
  runQuiet('migrations', process.execPath, migrationArgs(), env, apiDir);

  console.info(
    `▸ Generating ${plan.claims.toLocaleString('en-GB')} claims with ${plan.explainers.toLocaleString('en-GB')} published explainers`,
  );
  const generated = runQuiet(
    'the generator',
    process.execPath,
    [
      tsx,
      join(repoRoot, 'seeds-demo/src/generate.ts'),
      '--claims',
      String(plan.claims),
      '--explainers',
      String(plan.explainers),
    ],
    env,
  );
  console.info(`  ${generated.trim().split('\n').pop()}`);

  const pool = createPool({
    host: db.access.DB_HOST,
    port: Number(db.access.DB_PORT),
    user: db.access.DB_USER,
    password: db.access.DB_PASSWORD,
    database: db.name,
    connectionLimit: 8,
  });
  cleanups.add(() => pool.end());
  // Fresh statistics, as a live database has them; the FULLTEXT index is the reference's.
  await pool.query(
    'ANALYZE TABLE claims, claim_topics, claim_sources, publications, verdict_versions, workings',
  );
  const indexed = performance.now();
  await pool.query(createFulltextIndex);
  console.info(
    `  FULLTEXT index for the SQL reference in ${((performance.now() - indexed) / 1000).toFixed(1)} s`,
  );

  const password = randomBytes(18).toString('base64url');
  runQuiet(
    'the benchmark desk chief',
    process.execPath,
    [
      join(apiDir, 'dist/cli/create-desk-chief.js'),
      `--email=${BENCH_EMAIL}`,
      '--name=Benchmark desk chief',
      // Joined to its option: a generated password may start with a dash.
      `--password=${password}`,
    ],
    env,
  );

  const deskDist = join(repoRoot, 'apps/web/dist');
  if (existsSync(join(deskDist, 'index.html'))) cpSync(deskDist, webDir, { recursive: true });
  else {
    mkdirSync(webDir, { recursive: true });
    writeFileSync(join(webDir, 'index.html'), '<!doctype html><title>Skyledger</title>');
  }

  console.info('▸ Starting the built API (cold start: until it answers a search)');
  const started = await coldStart(env, port, password);
  cleanups.add(() => stopService(started.api, 'the API'));

  const dataset = Object.fromEntries(
    (
      await rowsOf<{ name: string; count: number }>(
        pool,
        `SELECT 'claims' AS name, COUNT(*) AS count FROM claims
           UNION ALL SELECT 'published explainers', COUNT(*) FROM claims WHERE status = 'published'
           UNION ALL SELECT 'sources', COUNT(*) FROM sources
           UNION ALL SELECT 'workings', COUNT(*) FROM workings
           UNION ALL SELECT 'verdict versions', COUNT(*) FROM verdict_versions
           UNION ALL SELECT 'publications', COUNT(*) FROM publications`,
      )
    ).map((row) => [row.name, Number(row.count)]),
  );
  const ids = (sql: string) =>
    rowsOf<{ id: string }>(pool, sql).then((rows) => rows.map((row) => String(row.id)));
  const samples: Samples = {
    claimIds: await ids(`SELECT id FROM claims WHERE status = 'published' ORDER BY id LIMIT 200`),
    researchIds: await ids(
      `SELECT id FROM claims WHERE status = 'in_research' ORDER BY id LIMIT 200`,
    ),
    slugs: await ids(`SELECT slug AS id FROM claims WHERE slug IS NOT NULL ORDER BY id LIMIT 50`),
  };
  return {
    baseUrl: started.baseUrl,
    headers: started.headers,
    pool,
    api: started.api,
    webDir,
    samples,
    dataset,
    coldStart: started.coldStart,
  };
}
