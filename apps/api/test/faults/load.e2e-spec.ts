import { benchPlans } from '@skyledger/devstack/bench/plan';
import { Cleanups, startBenchStack, type BenchStack } from '@skyledger/devstack/bench/bench-stack';
import { httpRunner, loadInTurns, type RequestSpec } from '@skyledger/devstack/bench/load';
import { deskQueries } from '@skyledger/devstack/bench/search-cases';
import { databaseAccess } from '@skyledger/devstack/test-database';
import { createConnection, type Connection, type RowDataPacket } from 'mysql2/promise';
import { type DatabaseConfig } from '../../src/config/configuration';
import { dataSourceOptions } from '../../src/database/data-source-options';

const CONNECTIONS = 200;
/** 5 s in `npm test`; `npm run test:faults` sets 60, as the issue asks. */
const SECONDS = Number(process.env.LOAD_TEST_SECONDS ?? 5);
const SAMPLE_EVERY_MS = 50;

/** The most connections the API's TypeORM pool may open (mysql2's `connectionLimit`). */
const poolLimit = (
  dataSourceOptions({} as DatabaseConfig) as { extra: { connectionLimit: number } }
).extra.connectionLimit;

/** Connections MariaDB turned away because it had no room (its `max_connections`). */
async function refusedConnections(monitor: Connection): Promise<number> {
  const [rows] = await monitor.query<RowDataPacket[]>(
    "SHOW GLOBAL STATUS LIKE 'Connection_errors_max_connections'",
  );
  return Number(rows[0]!.Value);
}

/**
 * Every `SAMPLE_EVERY_MS`, how many connections MariaDB holds open to the database: the
 * API's pool only, as the load itself runs over HTTP and the stack's own pool is closed.
 */
function watchConnections(monitor: Connection, databaseName: string) {
  const counts: number[] = [];
  let running = true;
  let stopped: Promise<{ max: number; samples: number }> | undefined;
  const done = (async () => {
    while (running) {
      const [rows] = await monitor.query<RowDataPacket[]>(
        'SELECT COUNT(*) AS used FROM information_schema.PROCESSLIST WHERE DB = ?',
        [databaseName],
      );
      counts.push(Number(rows[0]!.used));
      await new Promise((resolve) => setTimeout(resolve, SAMPLE_EVERY_MS));
    }
  })();
  return {
    stop() {
      running = false;
      return (stopped ??= done.then(() => ({ max: Math.max(...counts), samples: counts.length })));
    },
  };
}

/**
 * 200 connections at once for `SECONDS` on the desk's queue and search and on the reader
 * pages, over loopback against the built API on a generated desk of 5 000 claims (the
 * benchmark's stack): every answer is a 2xx within autocannon's 10 s, MariaDB never holds
 * more connections to the database than the API's pool allows, and it turns none away.
 * Each connection sends its next request once the last is answered, so at most 200 are in
 * flight: requests beyond the pool's 20 wait in the pool's queue, never fail.
 */
describe('200 concurrent connections on the queue, search and reader pages', () => {
  const cleanups = new Cleanups();
  let stack: BenchStack;
  let monitor: Connection;
  let databaseName: string;

  beforeAll(async () => {
    stack = await startBenchStack(
      { ...benchPlans.quick, seconds: SECONDS, warmupSeconds: 1 },
      cleanups,
    );
    const [rows] = await stack.pool.query<RowDataPacket[]>('SELECT DATABASE() AS name');
    databaseName = String(rows[0]!.name);
    const access = databaseAccess();
    monitor = await createConnection({
      host: access.DB_HOST,
      port: Number(access.DB_PORT),
      user: access.DB_USER,
      password: access.DB_PASSWORD,
    });
    cleanups.add(() => monitor.end());
    // The stack's own pool is not needed again: closed, every connection left is the API's.
    await stack.pool.end();
  }, 300_000);

  afterAll(() => cleanups.run(), 60_000);

  it(
    `answers every request with a 2xx, within the pool (${SECONDS} s)`,
    async () => {
      const desk = (path: string): RequestSpec => ({ path, headers: stack.headers });
      const requests: RequestSpec[] = [
        // The desk's first page as it opens, a later one, and filtered and sorted pages.
        ...[
          '',
          'page=3&',
          'status=in_research&sort=updatedAt&order=desc&',
          'status=published&topic=sea-level&sort=filedAt&order=desc&',
          'status=awaiting_signoff&legal=false&sort=summary&order=asc&',
        ].map((filters) => desk(`/api/claims?${filters}pageSize=25`)),
        ...deskQueries.map((q) => desk(`/api/search?${new URLSearchParams({ q })}`)),
        { path: '/explainers' },
        { path: '/explainers?page=2' },
        { path: `/explainers?q=${encodeURIComponent(deskQueries[0]!)}` },
        ...stack.samples.slugs.slice(0, 20).map((slug) => ({ path: `/explainers/${slug}` })),
      ];

      // Each request once, in turn, as a desk and its readers would arrive: a cold start
      // under 200 requests at once (every reader page rendered and every query planned at
      // the same moment) is not the load being measured.
      for (const request of requests) {
        const response = await fetch(`${stack.baseUrl}${request.path}`, {
          headers: request.headers ?? {},
        });
        expect({ path: request.path, status: response.status }).toEqual({
          path: request.path,
          status: 200,
        });
        await response.arrayBuffer();
      }

      const refusedBefore = await refusedConnections(monitor);
      const connections = watchConnections(monitor, databaseName);
      const [result] = await loadInTurns([httpRunner(stack.baseUrl, requests, CONNECTIONS)], {
        seconds: SECONDS,
        warmupSeconds: 1,
        rounds: 1,
      }).finally(() => connections.stop());
      const used = await connections.stop();
      const refused = (await refusedConnections(monitor)) - refusedBefore;

      console.info(
        `Load: ${CONNECTIONS} connections for ${SECONDS} s on the queue, search and reader pages ` +
          `(${requests.length} requests in turn, ${stack.dataset.claims} claims): ` +
          `${result.requests} answered, ${result.perSecond.toFixed(0)}/s, ` +
          `p50 ${result.p50.toFixed(0)} ms, p95 ${result.p95.toFixed(0)} ms, p99 ${result.p99.toFixed(0)} ms; ` +
          `errors and non-2xx ${result.failures}${result.failedStatuses.length ? ` (${result.failedStatuses.join(', ')})` : ''}; ` +
          `MariaDB connections used at most ${used.max} of the pool's ${poolLimit} (${used.samples} samples), ` +
          `refused for want of room ${refused}`,
      );
      expect(result.failures).toBe(0);
      expect(result.requests).toBeGreaterThan(0);
      expect(used.max).toBeGreaterThan(0);
      expect(used.max).toBeLessThanOrEqual(poolLimit);
      expect(refused).toBe(0);
    },
    (SECONDS + 1) * 1000 + 120_000,
  );
});
