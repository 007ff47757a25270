import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { backupCommand, restoreCommand } from './backup-commands.js';
import * as mariadb from './mariadb.js';
import { runFaultTests } from './fault-tests.js';
import { dataDir } from './paths.js';
import { StepFailedError } from './processes.js';
import { startStack } from './start.js';
import { runAllTests } from './test-run.js';

const commands: Record<string, () => Promise<number>> = {
  start: startStack,
  test: runAllTests,
  'test:faults': runFaultTests,
  // Loaded on demand: the benchmark reads packages that only exist once they are built.
  bench: async () => (await import('./bench/run-bench.js')).runBench('full'),
  'bench:quick': async () => (await import('./bench/run-bench.js')).runBench('quick'),
  'db:start': async () => {
    const started = await mariadb.start();
    const { port, datadir } = mariadb.status();
    console.info(
      `${started ? 'Started' : 'Already running:'} private MariaDB on 127.0.0.1:${port} (datadir ${datadir})`,
    );
    return 0;
  },
  'db:stop': async () => {
    console.info(
      (await mariadb.stop())
        ? 'Stopped the private MariaDB.'
        : 'The private MariaDB was not running.',
    );
    return 0;
  },
  'db:status': async () => {
    const state = mariadb.status();
    console.info(
      state.running
        ? `Running: pid ${state.pid}, 127.0.0.1:${state.port}, datadir ${state.datadir}`
        : `Not running (datadir ${state.datadir})`,
    );
    return state.running ? 0 : 3;
  },
  'db:backup': () => backupCommand(process.argv.slice(3)),
  'db:restore': () => restoreCommand(process.argv.slice(3)),
  'demo:reset': async () => {
    await mariadb.resetAppDatabase();
    for (const folder of ['files', 'maildev']) {
      rmSync(join(dataDir, folder), { recursive: true, force: true });
    }
    console.info(
      'The demo desk is empty again (database, stored files and caught mail); `npm start` migrates and seeds it afresh.',
    );
    return 0;
  },
  'db:reset': async () => {
    await mariadb.reset();
    console.info('The private MariaDB is empty again; `npm start` migrates and seeds it.');
    return 0;
  },
};

const name = process.argv[2] ?? '';
const command = commands[name];
if (!command) {
  console.error(`Unknown command "${name}".`);
  process.exit(2);
}
command().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error instanceof StepFailedError ? `\n✗ ${error.message}` : error);
    process.exit(1);
  },
);
