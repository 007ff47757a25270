import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { userInfo } from 'node:os';
import { join } from 'node:path';
import { dataDir } from './paths.js';
import { isPortOpen, StepFailedError, waitFor } from './processes.js';
import { localSecrets } from './secrets.js';
import { type DatabaseAccess } from './test-database.js';

/**
 * The project's own MariaDB: its own datadir, socket and port, bound to 127.0.0.1, never
 * the system service. `--no-defaults` comes first in every call, or /etc/mysql/my.cnf
 * sends the server and the clients to the system socket (STACK.md).
 */
const home = join(dataDir, 'mariadb');
const files = {
  data: join(home, 'data'),
  socket: join(home, 'mysqld.sock'),
  pid: join(home, 'mysqld.pid'),
  log: join(home, 'mysqld.err'),
};

export const database = {
  host: '127.0.0.1',
  port: Number(process.env.SKYLEDGER_DB_PORT ?? 3307),
  user: 'skyledger',
  name: 'skyledger',
  /** Tests and benchmarks create databases under these prefixes and drop them. */
  testPrefix: 'skyledger_test',
  benchPrefix: 'skyledger_bench',
};

const isRoot = process.getuid?.() === 0;
/** mariadb-install-db gives the installing OS user a socket-authenticated admin account. */
const adminUser = isRoot ? 'root' : userInfo().username;

/** The environment the API and the tools need to reach the app database. */
export function databaseEnv(
  name = database.name,
): DatabaseAccess & { DB_NAME: string } & Record<string, string> {
  return {
    DB_HOST: database.host,
    DB_PORT: String(database.port),
    DB_USER: database.user,
    DB_PASSWORD: localSecrets().dbPassword,
    DB_NAME: name,
  };
}

function admin(args: string[]): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync(
    'mariadb-admin',
    ['--no-defaults', `--socket=${files.socket}`, `-u${adminUser}`, ...args],
    { encoding: 'utf8' },
  );
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

export function runSql(sql: string): string {
  const result = spawnSync(
    'mariadb',
    [
      '--no-defaults',
      `--socket=${files.socket}`,
      `-u${adminUser}`,
      '--batch',
      '--skip-column-names',
    ],
    { input: sql, encoding: 'utf8' },
  );
  if (result.status !== 0) throw new StepFailedError(`SQL failed: ${result.stderr.trim()}`);
  return result.stdout;
}

function serverPid(): number | undefined {
  if (!existsSync(files.pid)) return undefined;
  const pid = Number(readFileSync(files.pid, 'utf8').trim());
  if (!Number.isInteger(pid) || pid <= 0) return undefined;
  try {
    process.kill(pid, 0);
    return pid;
  } catch {
    return undefined;
  }
}

function pings(): boolean {
  return admin(['--silent', 'ping']).status === 0;
}

export function status(): { running: boolean; pid?: number; port: number; datadir: string } {
  const pid = serverPid();
  return { running: pid !== undefined && pings(), pid, port: database.port, datadir: files.data };
}

function initialise(): void {
  mkdirSync(home, { recursive: true });
  console.info(`Creating the private MariaDB datadir in ${files.data}`);
  const result = spawnSync(
    'mariadb-install-db',
    [
      '--no-defaults',
      `--datadir=${files.data}`,
      ...(isRoot ? ['--user=root'] : []),
      '--auth-root-authentication-method=socket',
      '--skip-test-db',
      '--skip-name-resolve',
    ],
    { encoding: 'utf8' },
  );
  if (result.status !== 0) {
    rmSync(files.data, { recursive: true, force: true });
    throw new StepFailedError(`mariadb-install-db failed:\n${result.stderr || result.stdout}`);
  }
}

function logTail(): string {
  if (!existsSync(files.log)) return '(no log)';
  return readFileSync(files.log, 'utf8').trim().split('\n').slice(-15).join('\n');
}

/** Grants the app user its database and the test and benchmark databases. */
function ensureAppUser(): void {
  const password = localSecrets().dbPassword.replace(/'/g, "''");
  const user = `'${database.user}'@'127.0.0.1'`;
  runSql(`
    CREATE USER IF NOT EXISTS ${user} IDENTIFIED BY '${password}';
    ALTER USER ${user} IDENTIFIED BY '${password}';
    CREATE DATABASE IF NOT EXISTS \`${database.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    GRANT ALL PRIVILEGES ON \`${database.name}\`.* TO ${user};
    GRANT ALL PRIVILEGES ON \`${database.testPrefix.replace(/_/g, '\\_')}%\`.* TO ${user};
    GRANT ALL PRIVILEGES ON \`${database.benchPrefix.replace(/_/g, '\\_')}%\`.* TO ${user};
  `);
}

/** Starts the instance if it is not running. Returns whether this call started it. */
export async function start(): Promise<boolean> {
  if (status().running) {
    ensureAppUser();
    return false;
  }
  if (files.socket.length > 100) {
    throw new StepFailedError(
      `The socket path ${files.socket} is too long for a Unix socket; clone the repo to a shorter path.`,
    );
  }
  if (await isPortOpen(database.port)) {
    throw new StepFailedError(
      `Port ${database.port} on 127.0.0.1 is taken by another program. Set SKYLEDGER_DB_PORT to a free port.`,
    );
  }
  if (!existsSync(join(files.data, 'mysql'))) initialise();
  rmSync(files.socket, { force: true });
  const server = spawn(
    'mariadbd',
    [
      '--no-defaults',
      `--datadir=${files.data}`,
      `--socket=${files.socket}`,
      `--pid-file=${files.pid}`,
      `--port=${database.port}`,
      '--bind-address=127.0.0.1',
      ...(isRoot ? ['--user=root'] : []),
      `--log-error=${files.log}`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      // Instants are stored in UTC; defaults such as CURRENT_TIMESTAMP(3) must be UTC too.
      '--default-time-zone=+00:00',
      '--max-connections=500',
    ],
    { detached: true, stdio: 'ignore' },
  );
  server.unref();
  let exited = false;
  server.once('exit', () => (exited = true));
  try {
    await waitFor(
      'MariaDB',
      () => {
        if (exited)
          throw new StepFailedError(`MariaDB exited while starting. Its log:\n${logTail()}`);
        return pings();
      },
      { timeoutMs: 60_000, intervalMs: 100 },
    );
  } catch (error) {
    if (error instanceof StepFailedError && !exited) {
      throw new StepFailedError(`${error.message}. Its log:\n${logTail()}`);
    }
    throw error;
  }
  ensureAppUser();
  return true;
}

export async function stop(): Promise<boolean> {
  const pid = serverPid();
  if (pid === undefined) return false;
  const result = admin(['shutdown']);
  if (result.status !== 0) process.kill(pid, 'SIGTERM');
  await waitFor('MariaDB to stop', () => serverPid() === undefined, {
    timeoutMs: 60_000,
    intervalMs: 100,
  });
  return true;
}

/** Wipes the datadir and starts an empty instance (the app user and database included). */
export async function reset(): Promise<void> {
  await stop();
  rmSync(files.data, { recursive: true, force: true });
  await start();
}

/** Empties the app's own database (the demo), leaving test and benchmark databases alone. */
export async function resetAppDatabase(): Promise<void> {
  await start();
  runSql(`
    DROP DATABASE IF EXISTS \`${database.name}\`;
    CREATE DATABASE \`${database.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
  `);
}
