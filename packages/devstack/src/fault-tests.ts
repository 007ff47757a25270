import { join } from 'node:path';
import { buildIfNeeded } from './bench/build.js';
import * as mariadb from './mariadb.js';
import { repoRoot } from './paths.js';
import { runCounted } from './processes.js';

/** How long the load suite runs here; `npm test` runs it for its default of 5 s. */
const FULL_LOAD_SECONDS = '60';

/**
 * `npm run test:faults`: the suites of apps/api/test/faults at full length (the load run
 * for 60 s), one at a time so no fault disturbs another's figures, on the built API (built
 * first where a source is newer than its output).
 */
export async function runFaultTests(): Promise<number> {
  const startedDb = await mariadb.start();
  try {
    buildIfNeeded();
    console.info(`\n▸ Fault suites (apps/api/test/faults), the load for ${FULL_LOAD_SECONDS} s`);
    return runCounted(
      join(repoRoot, 'node_modules/.bin/jest'),
      ['--config', 'test/jest-e2e.config.js', '--runInBand', 'test/faults/'],
      {
        cwd: join(repoRoot, 'apps/api'),
        env: { ...mariadb.databaseEnv(), LOAD_TEST_SECONDS: FULL_LOAD_SECONDS },
      },
    );
  } finally {
    if (startedDb) await mariadb.stop();
  }
}
