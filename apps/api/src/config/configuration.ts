import { registerAs, type ConfigType } from '@nestjs/config';
import { join, resolve } from 'node:path';
import { validateEnv } from './env.schema';

/**
 * Typed configuration per area, read from the validated environment. Services inject
 * one area (`@Inject(authConfig.KEY) config: ConfigType<typeof authConfig>`), never
 * `process.env`.
 */
export const appConfig = registerAs('app', () => {
  const env = validateEnv(process.env);
  return {
    nodeEnv: env.NODE_ENV,
    host: env.HOST,
    port: env.PORT,
    appUrl: env.APP_URL.replace(/\/$/, ''),
    logLevel: env.LOG_LEVEL,
    webDistDir: env.WEB_DIST_DIR,
    newsroomName: env.NEWSROOM_NAME,
    deskTimeZone: env.DESK_TIME_ZONE,
  };
});

export const databaseConfig = registerAs('database', () => {
  const env = validateEnv(process.env);
  return {
    host: env.DB_HOST,
    port: env.DB_PORT,
    username: env.DB_USER,
    password: env.DB_PASSWORD,
    database: env.DB_NAME,
  };
});

export const authConfig = registerAs('auth', () => {
  const env = validateEnv(process.env);
  return {
    jwtSecret: env.JWT_SECRET,
    accessTtlSeconds: env.JWT_ACCESS_TTL_SECONDS,
    refreshTtlDays: env.REFRESH_TTL_DAYS,
    refreshReuseGraceSeconds: env.REFRESH_REUSE_GRACE_SECONDS,
    cookieSecure: env.COOKIE_SECURE ?? env.NODE_ENV === 'production',
    rateLimitPerMinute: env.AUTH_RATE_LIMIT_PER_MINUTE,
    lockoutThreshold: env.LOCKOUT_THRESHOLD,
    lockoutMinutes: env.LOCKOUT_MINUTES,
    inviteTtlHours: env.INVITE_TTL_HOURS,
    passwordResetTtlMinutes: env.PASSWORD_RESET_TTL_MINUTES,
  };
});

export const mailConfig = registerAs('mail', () => {
  const env = validateEnv(process.env);
  return {
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    user: env.SMTP_USER,
    password: env.SMTP_PASSWORD,
    from: env.MAIL_FROM,
    workerEnabled: env.OUTBOX_WORKER_ENABLED,
    pollMs: env.OUTBOX_POLL_MS,
    maxAttempts: env.OUTBOX_MAX_ATTEMPTS,
    staleSeconds: env.OUTBOX_STALE_SECONDS,
  };
});

export const searchConfig = registerAs('search', () => {
  const env = validateEnv(process.env);
  return {
    engine: env.SEARCH_ENGINE,
    meilisearch: { host: env.MEILI_HOST ?? '', apiKey: env.MEILI_API_KEY, index: env.MEILI_INDEX },
  };
});

export const publishingConfig = registerAs('publishing', () => {
  const env = validateEnv(process.env);
  return { pollMs: env.PUBLISH_POLL_MS, schedulerEnabled: env.PUBLISHER_ENABLED };
});

export const storageConfig = registerAs('storage', () => {
  const env = validateEnv(process.env);
  const credentials =
    env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
      ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY }
      : undefined;
  return {
    driver: env.FILES_STORAGE,
    /** The local store, and where uploads are staged before they are stored (S3 too). */
    directory: resolve(env.FILES_DIR ?? join(__dirname, '../../../.data/files')),
    maxUploadBytes: env.UPLOAD_MAX_BYTES,
    s3: {
      bucket: env.S3_BUCKET ?? '',
      region: env.S3_REGION,
      endpoint: env.S3_ENDPOINT,
      forcePathStyle: env.S3_FORCE_PATH_STYLE,
      credentials,
      prefix: env.S3_PREFIX,
    },
  };
});

export type AppConfig = ConfigType<typeof appConfig>;
export type DatabaseConfig = ConfigType<typeof databaseConfig>;
export type AuthConfig = ConfigType<typeof authConfig>;
export type MailConfig = ConfigType<typeof mailConfig>;
export type SearchConfig = ConfigType<typeof searchConfig>;
export type StorageConfig = ConfigType<typeof storageConfig>;
export type PublishingConfig = ConfigType<typeof publishingConfig>;
