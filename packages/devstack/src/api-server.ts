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

/**
 * The API's old-generation heap ceiling, in MB. Without one, V8 on a machine with many
 * gigabytes lets garbage pile up under load: at 100 000 claims the process grew past
 * 1 GB although what it kept (the search index, pools, caches) stayed near 250 MB
 * (npm run bench). With it, it collects sooner and stays under 512 MB. A desk much larger
 * than that, on the embedded search engine, needs it raised.
 */
export const API_HEAP_MB = 384;

/** Starts the built API (which also serves the built desk) and waits for its health check. */
export async function startApi(
  env: Record<string, string>,
  port: number,
  quiet = false,
): Promise<ChildProcess> {
  const child = startService(
    process.execPath,
    [`--max-old-space-size=${API_HEAP_MB}`, join(apiDir, 'dist/main.js')],
    {
      env: { ...env, PORT: String(port), HOST: '127.0.0.1' },
      stdio: quiet ? 'ignore' : 'inherit',
    },
  );
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
