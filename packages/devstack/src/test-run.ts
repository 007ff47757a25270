import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { databaseEnv } from './mariadb.js';
import * as mariadb from './mariadb.js';
import { repoRoot, tmpDir } from './paths.js';
import { runCounted } from './processes.js';

interface Tally {
  name: string;
  passed: number;
  failed: number;
  note?: string;
}

const resultsDir = join(tmpDir, 'test-results');
const bin = (name: string) => join(repoRoot, 'node_modules/.bin', name);

/** A check that passes or fails as a whole (lint, typecheck, build). */
function check(name: string, command: string, args: string[]): Tally {
  console.info(`\n▸ ${name}`);
  const ok = runCounted(command, args) === 0;
  return { name, passed: ok ? 1 : 0, failed: ok ? 0 : 1 };
}

/** A Vitest or Jest suite; both write the same JSON summary (numPassedTests, numFailedTests). */
function suite(
  name: string,
  cwd: string,
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv = {},
): Tally {
  console.info(`\n▸ ${name}`);
  const report = join(resultsDir, `${name.replace(/\W+/g, '-')}.json`);
  rmSync(report, { force: true });
  const isJest = command.endsWith('jest');
  const reportArgs = isJest
    ? ['--json', `--outputFile=${report}`]
    : ['--reporter=default', '--reporter=json', `--outputFile.json=${report}`];
  const exitCode = runCounted(command, [...args, ...reportArgs], { cwd, env });
  if (!existsSync(report))
    return { name, passed: 0, failed: 1, note: `crashed (exit ${exitCode}), no report` };
  const summary = JSON.parse(readFileSync(report, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numFailedTestSuites?: number;
    numRuntimeErrorTestSuites?: number;
  };
  // A file that fails to load has no failed test but a failed suite: count it, so it cannot pass silently.
  const brokenFiles = summary.numRuntimeErrorTestSuites ?? 0;
  const failed = summary.numFailedTests + brokenFiles;
  const note = exitCode !== 0 && failed === 0 ? `exit ${exitCode}` : undefined;
  return {
    name,
    passed: summary.numPassedTests,
    failed: failed + (note ? 1 : 0),
    ...(note ? { note } : {}),
  };
}

/**
 * `npm test`: every check and suite, against the private MariaDB (started here when it
 * is not running, stopped again afterwards). Ends with one line: `N passed, N failed`.
 */
export async function runAllTests(): Promise<number> {
  mkdirSync(resultsDir, { recursive: true });
  const startedDb = await mariadb.start();
  const tallies: Tally[] = [];
  try {
    const dbEnv = databaseEnv();
    tallies.push(check('lint', 'npm', ['run', 'lint', '--silent']));
    tallies.push(check('typecheck', 'npm', ['run', 'typecheck', '--silent']));
    const build = check('build', 'npm', ['run', 'build', '--silent']);
    tallies.push(build);

    tallies.push(suite('calc-library', join(repoRoot, 'calc-library'), bin('vitest'), ['run']));
    tallies.push(suite('contracts', join(repoRoot, 'packages/contracts'), bin('vitest'), ['run']));
    tallies.push(suite('explainer', join(repoRoot, 'packages/explainer'), bin('vitest'), ['run']));
    tallies.push(suite('seeds-demo', join(repoRoot, 'seeds-demo'), bin('vitest'), ['run']));
    tallies.push(suite('web', join(repoRoot, 'apps/web'), bin('vitest'), ['run']));
    tallies.push(suite('api unit', join(repoRoot, 'apps/api'), bin('jest'), []));
    tallies.push(
      suite(
        'api e2e',
        join(repoRoot, 'apps/api'),
        bin('jest'),
        ['--config', 'test/jest-e2e.config.js'],
        dbEnv,
      ),
    );
    if (build.failed === 0) {
      tallies.push(
        suite(
          'browser',
          join(repoRoot, 'apps/web'),
          bin('vitest'),
          ['run', '--config', 'vitest.browser.config.ts'],
          dbEnv,
        ),
      );
    } else {
      tallies.push({ name: 'browser', passed: 0, failed: 1, note: 'skipped: the build failed' });
    }
  } finally {
    if (startedDb) await mariadb.stop();
  }

  console.info('\nSuites:');
  for (const tally of tallies) {
    console.info(
      `  ${tally.failed ? '✗' : '✓'} ${tally.name.padEnd(14)} ${tally.passed} passed, ${tally.failed} failed${tally.note ? ` (${tally.note})` : ''}`,
    );
  }
  const passed = tallies.reduce((sum, tally) => sum + tally.passed, 0);
  const failed = tallies.reduce((sum, tally) => sum + tally.failed, 0);
  console.info(`\n${passed} passed, ${failed} failed`);
  return failed === 0 ? 0 : 1;
}
