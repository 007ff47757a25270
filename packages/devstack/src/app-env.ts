import { databaseEnv } from './mariadb.js';
import { localSecrets } from './secrets.js';

/** The API's environment for a local run: private database, local secrets, loopback mail. */
export function appEnv(options: {
  port: number;
  smtpPort: number;
  databaseName?: string;
}): Record<string, string> {
  return {
    NODE_ENV: 'development',
    APP_URL: `http://127.0.0.1:${options.port}`,
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
    ...databaseEnv(options.databaseName),
    JWT_SECRET: localSecrets().jwtSecret,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(options.smtpPort),
    // The demo newsroom (seeds-demo) works in London.
    NEWSROOM_NAME: 'Marrowby Gazette',
    DESK_TIME_ZONE: 'Europe/London',
  };
}
