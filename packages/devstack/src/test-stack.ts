import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { apiDir, migrationArgs, startApi } from './api-server.js';
import { appEnv } from './app-env.js';
import { freePort } from './free-port.js';
import { startMailCatcher } from './mail-catcher.js';
import { repoRoot, tmpDir } from './paths.js';
import { runQuiet, stopService } from './processes.js';
import { TestDatabase } from './test-database.js';

export interface TestStack {
  /** Where the built desk and API answer, e.g. http://127.0.0.1:41234 */
  baseUrl: string;
  /** MailDev's REST API root, e.g. http://127.0.0.1:41235/api */
  mailApiUrl: string;
  stop(): Promise<void>;
}

/**
 * The built app as `npm start` runs it, on a database of its own and free ports, for
 * browser tests: migrated, seeded with the demo newsroom, with a mail catcher.
 * Needs `npm run build` to have run.
 */
export async function startTestStack(name: string): Promise<TestStack> {
  const database = new TestDatabase(name);
  await database.create();
  const [port, smtpPort, webPort] = [await freePort(), await freePort(), await freePort()];
  const filesDir = join(tmpDir, `files-${database.name}`);
  const env = {
    ...appEnv({ port, smtpPort, databaseName: database.name }),
    ...database.access,
    DB_NAME: database.name,
    OUTBOX_POLL_MS: '200',
    // Every test signs in from 127.0.0.1; the per-address limit has its own API test.
    AUTH_RATE_LIMIT_PER_MINUTE: '1000',
    FILES_DIR: filesDir,
  };
  const stops: Array<() => Promise<unknown>> = [
    () => database.drop(),
    () => rm(filesDir, { recursive: true, force: true }),
  ];
  try {
    runQuiet('migrations', process.execPath, migrationArgs(), env, apiDir);
    runQuiet(
      'the demo seed',
      process.execPath,
      [join(repoRoot, 'node_modules/tsx/dist/cli.mjs'), join(repoRoot, 'seeds-demo/src/run.ts')],
      env,
    );
    const mail = await startMailCatcher({
      smtpPort,
      webPort,
      mailDirectory: join(tmpDir, `maildev-${database.name}`),
      quiet: true,
    });
    stops.push(() => stopService(mail, 'the mail catcher'));
    const api = await startApi(env, port, true);
    stops.push(() => stopService(api, 'the API'));
  } catch (error) {
    for (const stop of stops.reverse()) await stop();
    throw error;
  }
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    mailApiUrl: `http://127.0.0.1:${webPort}/api`,
    async stop() {
      for (const stop of stops.reverse()) await stop().catch(() => undefined);
    },
  };
}
