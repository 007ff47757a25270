import { apiDir, migrationArgs, startApi } from '@skyledger/devstack/api-server';
import { freePort } from '@skyledger/devstack/free-port';
import { database, MariaDbInstance } from '@skyledger/devstack/mariadb';
import { databaseAccess } from '@skyledger/devstack/test-database';
import { spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtemp, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { createConnection } from 'mysql2/promise';

const LOAD_WORKERS = 4;
/** The longest the API may take to answer normally again once the database is back. */
const RECONNECT_LIMIT_MS = 10_000;

/**
 * Kills a MariaDB of the test's own (never the project's private one) during a write load:
 * while it is down the API answers 503, it reconnects by itself once the database is back,
 * and every write it acknowledged is there afterwards.
 */
describe('the database dies during a write load', () => {
  let home: string;
  let db: MariaDbInstance;
  let api: ChildProcess | undefined;
  let env: Record<string, string>;
  let base: string;

  beforeAll(async () => {
    home = await mkdtemp(join(__dirname, '../../../../tmp', 'fault-db-'));
    db = new MariaDbInstance(home, await freePort(), 'fault-test MariaDB');
    await db.start();
    const port = await freePort();
    base = `http://127.0.0.1:${port}`;
    env = {
      ...(process.env as Record<string, string>),
      NODE_ENV: 'test',
      LOG_LEVEL: 'silent',
      DB_HOST: '127.0.0.1',
      DB_PORT: String(db.port),
      DB_USER: database.user,
      DB_PASSWORD: databaseAccess().DB_PASSWORD,
      DB_NAME: database.name,
      JWT_SECRET: randomBytes(32).toString('hex'),
      OUTBOX_WORKER_ENABLED: 'false',
      PUBLISHER_ENABLED: 'false',
      AUTH_RATE_LIMIT_PER_MINUTE: '100000',
      FILES_DIR: join(home, 'files'),
    };
    const migrate = spawnSync(process.execPath, migrationArgs(), {
      cwd: apiDir,
      env,
      encoding: 'utf8',
    });
    if (migrate.status !== 0) throw new Error(`migrations failed: ${migrate.stderr}`);
    const chief = spawnSync(
      process.execPath,
      [
        join(apiDir, 'dist/cli/create-desk-chief.js'),
        '--email',
        'chief@fault.test',
        '--name',
        'Fault Chief',
        '--password',
        'fault-test-password',
      ],
      { env, encoding: 'utf8' },
    );
    if (chief.status !== 0) throw new Error(`create-desk-chief failed: ${chief.stderr}`);
    api = await startApi(env, port, true);
  }, 120_000);

  afterAll(async () => {
    if (api?.pid) process.kill(-api.pid, 'SIGKILL');
    await db.stop().catch(() => db.kill());
    await rm(home, { recursive: true, force: true });
  });

  it('answers 503 while it is down, recovers within 10 s, and loses no acknowledged write', async () => {
    const json = { 'Content-Type': 'application/json' };
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: json,
      body: JSON.stringify({ email: 'chief@fault.test', password: 'fault-test-password' }),
    });
    const { accessToken } = (await signIn.json()) as { accessToken: string };
    const headers = { ...json, Authorization: `Bearer ${accessToken}` };
    const filed = await fetch(`${base}/api/claims`, {
      method: 'POST',
      headers,
      body: JSON.stringify({
        text: 'The fault test files this claim to comment on it under load.',
        summary: 'A claim for the outage test',
        topics: ['faults'],
        claimant: { name: 'Fault test', kind: 'organisation' },
      }),
    });
    const claim = (await filed.json()) as { id: string };

    const acknowledged: string[] = [];
    const statuses = new Map<number, number>();
    let running = true;
    let sent = 0;
    const worker = async () => {
      while (running) {
        sent += 1;
        try {
          const response = await fetch(`${base}/api/claims/${claim.id}/comments`, {
            method: 'POST',
            headers,
            body: JSON.stringify({ body: `Comment ${sent} under load` }),
          });
          statuses.set(response.status, (statuses.get(response.status) ?? 0) + 1);
          if (response.status === 201)
            acknowledged.push(((await response.json()) as { id: string }).id);
          else await response.arrayBuffer();
        } catch {
          statuses.set(0, (statuses.get(0) ?? 0) + 1);
        }
      }
    };
    const load = Array.from({ length: LOAD_WORKERS }, worker);

    await new Promise((resolve) => setTimeout(resolve, 1500));
    const beforeOutage = acknowledged.length;
    await db.kill();
    await new Promise((resolve) => setTimeout(resolve, 2000));
    const health = await fetch(`${base}/api/health`);
    expect(health.status).toBe(503);
    const duringOutage = await fetch(`${base}/api/claims/${claim.id}`, { headers });
    expect(duringOutage.status).toBe(503);
    expect(duringOutage.headers.get('retry-after')).toBe('5');
    expect(await duringOutage.json()).toMatchObject({
      statusCode: 503,
      error: 'Service Unavailable',
    });

    await db.start();
    const back = Date.now();
    let recoveredMs = Number.POSITIVE_INFINITY;
    while (Date.now() - back < RECONNECT_LIMIT_MS + 5_000) {
      const probe = await fetch(`${base}/api/claims/${claim.id}`, { headers });
      await probe.arrayBuffer();
      if (probe.status === 200) {
        recoveredMs = Date.now() - back;
        break;
      }
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    await new Promise((resolve) => setTimeout(resolve, 1500));
    running = false;
    await Promise.all(load);

    console.info(
      `Database outage: ${sent} writes sent, ${acknowledged.length} acknowledged (${beforeOutage} before the outage), answers ${JSON.stringify(Object.fromEntries(statuses))}, back in ${recoveredMs} ms`,
    );
    expect(recoveredMs).toBeLessThanOrEqual(RECONNECT_LIMIT_MS);
    expect(statuses.get(503)).toBeGreaterThan(0);
    expect([...statuses.keys()].filter((status) => status >= 500 && status !== 503)).toEqual([]);
    expect(acknowledged.length).toBeGreaterThan(beforeOutage);

    const connection = await createConnection({
      host: '127.0.0.1',
      port: db.port,
      user: database.user,
      password: env.DB_PASSWORD,
      database: database.name,
    });
    try {
      const [rows] = await connection.query('SELECT id FROM comments WHERE claim_id = ?', [
        claim.id,
      ]);
      const stored = new Set((rows as Array<{ id: string }>).map((row) => row.id));
      const lost = acknowledged.filter((id) => !stored.has(id));
      console.info(`Database outage: writes lost ${lost.length}`);
      expect(lost).toEqual([]);
    } finally {
      await connection.end();
    }
  }, 120_000);
});
