import { type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { repoRoot } from './paths.js';
import { startService, StepFailedError, waitFor } from './processes.js';

export const apiDir = join(repoRoot, 'apps/api');

/** Runs the API's migrations against the database named in `env`. */
export function migrationArgs(): string[] {
  return [
    join(repoRoot, 'node_modules/typeorm/cli.js'),
    'migration:run',
    '-d',
    join(apiDir, 'dist/database/data-source.js'),
  ];
}

/** Starts the built API (which also serves the built desk) and waits for its health check. */
export async function startApi(
  env: Record<string, string>,
  port: number,
  quiet = false,
): Promise<ChildProcess> {
  const child = startService(process.execPath, [join(apiDir, 'dist/main.js')], {
    env: { ...env, PORT: String(port), HOST: '127.0.0.1' },
    stdio: quiet ? 'ignore' : 'inherit',
  });
  let exited = false;
  child.once('exit', () => (exited = true));
  await waitFor(
    'the API',
    async () => {
      if (exited) throw new StepFailedError('the API exited while starting (see its log above)');
      try {
        return (await fetch(`http://127.0.0.1:${port}/api/health`)).ok;
      } catch {
        return false;
      }
    },
    { timeoutMs: 60_000 },
  );
  return child;
}
