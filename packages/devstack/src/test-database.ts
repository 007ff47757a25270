import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { createConnection } from 'mysql2/promise';
import { dataDir } from './paths.js';

export interface DatabaseAccess {
  DB_HOST: string;
  DB_PORT: string;
  DB_USER: string;
  DB_PASSWORD: string;
}

/**
 * How tests reach the private MariaDB: the DB_* variables `npm test` passes, or, when a
 * suite is run by hand, the credentials the dev stack keeps in .data/secrets.json.
 */
export function databaseAccess(): DatabaseAccess {
  let password = process.env.DB_PASSWORD;
  const secrets = join(dataDir, 'secrets.json');
  if (!password && existsSync(secrets)) {
    password = (JSON.parse(readFileSync(secrets, 'utf8')) as { dbPassword: string }).dbPassword;
  }
  if (!password) {
    throw new Error(
      'No database credentials: start the private MariaDB with `npm run db:start` first.',
    );
  }
  return {
    DB_HOST: process.env.DB_HOST ?? '127.0.0.1',
    DB_PORT: process.env.DB_PORT ?? '3307',
    DB_USER: process.env.DB_USER ?? 'skyledger',
    DB_PASSWORD: password,
  };
}

/**
 * A database of the suite's own on the private instance, dropped when the suite ends.
 * The benchmark makes its own under the `skyledger_bench` prefix, which the app user may
 * also create (mariadb.ts).
 */
export class TestDatabase {
  readonly name: string;

  constructor(
    suite: string,
    readonly access: DatabaseAccess = databaseAccess(),
    prefix = 'skyledger_test',
  ) {
    const slug = suite
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '_')
      .slice(0, 30);
    this.name = `${prefix}_${slug}_${randomBytes(4).toString('hex')}`;
  }

  async create(): Promise<void> {
    await this.run(
      `CREATE DATABASE \`${this.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
    );
  }

  async drop(): Promise<void> {
    await this.run(`DROP DATABASE IF EXISTS \`${this.name}\``);
  }

  private async run(sql: string): Promise<void> {
    const connection = await createConnection({
      host: this.access.DB_HOST,
      port: Number(this.access.DB_PORT),
      user: this.access.DB_USER,
      password: this.access.DB_PASSWORD,
    });
    try {
      await connection.query(sql);
    } finally {
      await connection.end();
    }
  }
}
