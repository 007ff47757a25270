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
interface InstanceFiles {
  home: string;
  data: string;
  socket: string;
  pid: string;
  log: string;
}

const filesIn = (home: string): InstanceFiles => ({
  home,
  data: join(home, 'data'),
  socket: join(home, 'mysqld.sock'),
  pid: join(home, 'mysqld.pid'),
  log: join(home, 'mysqld.err'),
});

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

/**
 * One MariaDB server with its own datadir, socket and port on 127.0.0.1. The project's
 * private instance is one; fault tests start throwaway ones they may kill.
 */
export class MariaDbInstance {
  readonly files: InstanceFiles;

  constructor(
    home: string,
    readonly port: number,
    private readonly label = 'MariaDB',
  ) {
    this.files = filesIn(home);
  }

  private admin(args: string[]): { status: number | null; stdout: string; stderr: string } {
    const result = spawnSync(
      'mariadb-admin',
      ['--no-defaults', `--socket=${this.files.socket}`, `-u${adminUser}`, ...args],
      { encoding: 'utf8' },
    );
    return { status: result.status, stdout: result.stdout, stderr: result.stderr };
  }

  runSql(sql: string): string {
    const result = spawnSync(
      'mariadb',
      [
        '--no-defaults',
        `--socket=${this.files.socket}`,
        `-u${adminUser}`,
        '--batch',
        '--skip-column-names',
      ],
      { input: sql, encoding: 'utf8' },
    );
    if (result.status !== 0) throw new StepFailedError(`SQL failed: ${result.stderr.trim()}`);
    return result.stdout;
  }

  serverPid(): number | undefined {
    if (!existsSync(this.files.pid)) return undefined;
    const pid = Number(readFileSync(this.files.pid, 'utf8').trim());
    if (!Number.isInteger(pid) || pid <= 0) return undefined;
    try {
      process.kill(pid, 0);
      return pid;
    } catch {
      return undefined;
    }
  }

  private pings(): boolean {
    return this.admin(['--silent', 'ping']).status === 0;
  }

  status(): { running: boolean; pid?: number; port: number; datadir: string } {
    const pid = this.serverPid();
    return {
      running: pid !== undefined && this.pings(),
      pid,
      port: this.port,
      datadir: this.files.data,
    };
  }

  private initialise(): void {
    mkdirSync(this.files.home, { recursive: true });
    console.info(`Creating the ${this.label} datadir in ${this.files.data}`);
    const result = spawnSync(
      'mariadb-install-db',
      [
        '--no-defaults',
        `--datadir=${this.files.data}`,
        ...(isRoot ? ['--user=root'] : []),
        '--auth-root-authentication-method=socket',
        '--skip-test-db',
        '--skip-name-resolve',
      ],
      { encoding: 'utf8' },
    );
    if (result.status !== 0) {
      rmSync(this.files.data, { recursive: true, force: true });
      throw new StepFailedError(`mariadb-install-db failed:\n${result.stderr || result.stdout}`);
    }
  }

  private logTail(): string {
    if (!existsSync(this.files.log)) return '(no log)';
    return readFileSync(this.files.log, 'utf8').trim().split('\n').slice(-15).join('\n');
  }

  /** Grants the app user its database and the test and benchmark databases. */
  ensureAppUser(): void {
    const password = localSecrets().dbPassword.replace(/'/g, "''");
    const user = `'${database.user}'@'127.0.0.1'`;
    this.runSql(`
      CREATE USER IF NOT EXISTS ${user} IDENTIFIED BY '${password}';
      ALTER USER ${user} IDENTIFIED BY '${password}';
      CREATE DATABASE IF NOT EXISTS \`${database.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
      GRANT ALL PRIVILEGES ON \`${database.name}\`.* TO ${user};
      GRANT ALL PRIVILEGES ON \`${database.testPrefix.replace(/_/g, '\\_')}%\`.* TO ${user};
      GRANT ALL PRIVILEGES ON \`${database.benchPrefix.replace(/_/g, '\\_')}%\`.* TO ${user};
    `);
  }

  /** Starts the instance if it is not running. Returns whether this call started it. */
  async start(): Promise<boolean> {
    if (this.status().running) {
      this.ensureAppUser();
      return false;
    }
    if (this.files.socket.length > 100) {
      throw new StepFailedError(
        `The socket path ${this.files.socket} is too long for a Unix socket; clone the repo to a shorter path.`,
      );
    }
    if (await isPortOpen(this.port)) {
      throw new StepFailedError(
        `Port ${this.port} on 127.0.0.1 is taken by another program. Set SKYLEDGER_DB_PORT to a free port.`,
      );
    }
    if (!existsSync(join(this.files.data, 'mysql'))) this.initialise();
    rmSync(this.files.socket, { force: true });
    const server = spawn(
      'mariadbd',
      [
        '--no-defaults',
        `--datadir=${this.files.data}`,
        `--socket=${this.files.socket}`,
        `--pid-file=${this.files.pid}`,
        `--port=${this.port}`,
        '--bind-address=127.0.0.1',
        ...(isRoot ? ['--user=root'] : []),
        `--log-error=${this.files.log}`,
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
        this.label,
        () => {
          if (exited)
            throw new StepFailedError(
              `${this.label} exited while starting. Its log:\n${this.logTail()}`,
            );
          return this.pings();
        },
        { timeoutMs: 60_000, intervalMs: 100 },
      );
    } catch (error) {
      if (error instanceof StepFailedError && !exited) {
        throw new StepFailedError(`${error.message}. Its log:\n${this.logTail()}`);
      }
      throw error;
    }
    this.ensureAppUser();
    return true;
  }

  async stop(): Promise<boolean> {
    const pid = this.serverPid();
    if (pid === undefined) return false;
    const result = this.admin(['shutdown']);
    if (result.status !== 0) process.kill(pid, 'SIGTERM');
    await waitFor(`${this.label} to stop`, () => this.serverPid() === undefined, {
      timeoutMs: 60_000,
      intervalMs: 100,
    });
    return true;
  }

  /** Ends the server at once, as a crash would: no shutdown, no flush. */
  async kill(): Promise<void> {
    const pid = this.serverPid();
    if (pid === undefined) return;
    process.kill(pid, 'SIGKILL');
    await waitFor(`${this.label} to die`, () => this.serverPid() === undefined, {
      timeoutMs: 10_000,
      intervalMs: 50,
    });
  }

  /** Wipes the datadir and starts an empty instance (the app user and database included). */
  async reset(): Promise<void> {
    await this.stop();
    rmSync(this.files.data, { recursive: true, force: true });
    await this.start();
  }
}

/** The project's private instance: `.data/mariadb`, its port from SKYLEDGER_DB_PORT. */
const privateInstance = new MariaDbInstance(
  join(dataDir, 'mariadb'),
  database.port,
  'private MariaDB',
);

export const runSql = (sql: string) => privateInstance.runSql(sql);
export const status = () => privateInstance.status();
export const start = () => privateInstance.start();
export const stop = () => privateInstance.stop();
export const reset = () => privateInstance.reset();

/** Empties the app's own database (the demo), leaving test and benchmark databases alone. */
export async function resetAppDatabase(): Promise<void> {
  await start();
  runSql(`
    DROP DATABASE IF EXISTS \`${database.name}\`;
    CREATE DATABASE \`${database.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
  `);
}
