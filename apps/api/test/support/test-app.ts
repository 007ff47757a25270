import { type INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { randomBytes } from 'node:crypto';
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module';
import { configureApp } from '../../src/configure-app';
import { dataSourceOptions } from '../../src/database/data-source-options';
import { UsersService } from '../../src/users/users.service';
import { type Role, type SessionResponse } from '@skyledger/contracts';
import { MailCatcher } from './mail-catcher';
import { TestDatabase } from '@skyledger/devstack/test-database';

export interface SignedIn {
  accessToken: string;
  /** The refresh cookie as the browser would send it back (`name=value`). */
  cookie: string;
  body: SessionResponse;
}

export interface TestApp {
  app: INestApplication;
  http: () => ReturnType<typeof request>;
  mail: MailCatcher;
  dataSource: DataSource;
  users: UsersService;
  /** Where this suite's local file store lives (FILES_DIR). */
  filesDir: string;
  /** Creates an active person with this role and password. */
  addUser(
    role: Role,
    email: string,
    password?: string,
  ): Promise<{ id: string; email: string; password: string }>;
  signIn(email: string, password: string): Promise<SignedIn>;
  close(): Promise<void>;
}

export const testPassword = 'correct horse battery';

/**
 * The real API on a database of the suite's own, with a real SMTP catcher: built from
 * the same AppModule and configureApp as main.ts. Migrations run first, as in `npm start`.
 */
export async function createTestApp(
  suite: string,
  env: Record<string, string> = {},
): Promise<TestApp> {
  const database = new TestDatabase(suite);
  await database.create();
  // Each suite stores its files apart, under the repository's ignored tmp folder.
  const filesDir = join(__dirname, '../../../../tmp', `files-${database.name}`);
  const mail = await new MailCatcher().start();
  Object.assign(process.env, {
    NODE_ENV: 'test',
    LOG_LEVEL: process.env.TEST_LOG_LEVEL ?? 'silent',
    ...database.access,
    DB_NAME: database.name,
    JWT_SECRET: randomBytes(32).toString('hex'),
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(mail.port),
    APP_URL: 'http://127.0.0.1:3000',
    OUTBOX_POLL_MS: '100',
    AUTH_RATE_LIMIT_PER_MINUTE: '1000',
    WEB_DIST_DIR: '/nonexistent',
    FILES_DIR: filesDir,
    ...env,
  });

  const migrator = new DataSource(
    dataSourceOptions({
      host: database.access.DB_HOST,
      port: Number(database.access.DB_PORT),
      username: database.access.DB_USER,
      password: database.access.DB_PASSWORD,
      database: database.name,
    }),
  );
  await migrator.initialize();
  await migrator.runMigrations();
  await migrator.destroy();

  const moduleRef = await Test.createTestingModule({ imports: [AppModule.forRoot()] }).compile();
  const app = configureApp(moduleRef.createNestApplication());
  await app.init();
  const http = () => request(app.getHttpServer());
  const users = app.get(UsersService);

  const testApp: TestApp = {
    app,
    http,
    mail,
    dataSource: app.get(DataSource),
    users,
    filesDir: process.env.FILES_DIR!,
    async addUser(role, email, password = testPassword) {
      const user = await users.upsertActiveUser({
        email,
        displayName: email.split('@')[0] ?? email,
        role,
        password,
      });
      return { id: user.id, email: user.email, password };
    },
    async signIn(email, password) {
      const response = await http().post('/api/auth/sign-in').send({ email, password }).expect(200);
      return {
        accessToken: response.body.accessToken,
        cookie: refreshCookieOf(response),
        body: response.body,
      };
    },
    async close() {
      await app.close();
      await mail.stop();
      await database.drop();
      await rm(filesDir, { recursive: true, force: true });
    },
  };
  return testApp;
}

/** The `name=value` of the refresh cookie a response set. */
export function refreshCookieOf(response: request.Response): string {
  const cookies = ([] as string[]).concat(response.headers['set-cookie'] ?? []);
  const cookie = cookies.find((value) => value.startsWith('skyledger_refresh='));
  if (!cookie) throw new Error(`no refresh cookie in ${JSON.stringify(cookies)}`);
  return cookie.split(';')[0]!;
}
