import { spawn, spawnSync, type ChildProcess, type SpawnOptions } from 'node:child_process';
import { createConnection } from 'node:net';
import { repoRoot } from './paths.js';

export class StepFailedError extends Error {}

/** Runs a command to completion with its output shown; throws when it fails. */
export function runStep(
  title: string,
  command: string,
  args: string[],
  options: { env?: NodeJS.ProcessEnv; cwd?: string } = {},
): void {
  console.info(`\n▸ ${title}`);
  const result = spawnSync(command, args, {
    cwd: options.cwd ?? repoRoot,
    env: { ...process.env, ...options.env },
    stdio: 'inherit',
  });
  if (result.status !== 0) {
    throw new StepFailedError(
      `${title} failed (${command} ${args.join(' ')}, exit ${result.status})`,
    );
  }
}

/** Runs a command with its output kept back unless it fails; returns what it printed. */
export function runQuiet(
  title: string,
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv,
  cwd = repoRoot,
): string {
  const result = spawnSync(command, args, {
    cwd,
    env: { ...process.env, ...env },
    encoding: 'utf8',
  });
  if (result.status !== 0)
    throw new StepFailedError(`${title} failed:\n${result.stdout}\n${result.stderr}`);
  return result.stdout;
}

/** Runs a command and reports its exit code instead of throwing. */
export function runCounted(
  command: string,
  args: string[],
  options: { env?: NodeJS.ProcessEnv; cwd?: string } = {},
): number {
  const result = spawnSync(command, args, {
    cwd: options.cwd ?? repoRoot,
    env: { ...process.env, ...options.env },
    stdio: 'inherit',
  });
  return result.status ?? 1;
}

/**
 * Starts a long-running service in its own process group, so a Ctrl-C in the terminal
 * reaches the dev stack only and the stack stops its services in order.
 */
export function startService(
  command: string,
  args: string[],
  options: SpawnOptions & { env?: NodeJS.ProcessEnv },
): ChildProcess {
  return spawn(command, args, {
    cwd: repoRoot,
    stdio: 'inherit',
    detached: true,
    ...options,
    env: { ...process.env, ...options.env },
  });
}

export async function stopService(
  child: ChildProcess,
  name: string,
  timeoutMs = 10_000,
): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null || child.pid === undefined) return;
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  process.kill(-child.pid, 'SIGTERM');
  const timer = setTimeout(() => {
    console.warn(`${name} did not stop in ${timeoutMs / 1000} s; killing it.`);
    if (child.pid !== undefined) process.kill(-child.pid, 'SIGKILL');
  }, timeoutMs);
  await exited;
  clearTimeout(timer);
}

export function isPortOpen(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = createConnection({ port, host });
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

export async function waitFor(
  what: string,
  check: () => Promise<boolean> | boolean,
  { timeoutMs = 60_000, intervalMs = 200 } = {},
): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((resolve) => setTimeout(resolve, intervalMs));
  }
  throw new StepFailedError(`${what} was not ready after ${timeoutMs / 1000} s`);
}

export const npmCommand = 'npm';
