import { isTimeZone } from '@skyledger/contracts';
import { z } from 'zod';

const bool = z
  .enum(['true', 'false', '1', '0'])
  .transform((value) => value === 'true' || value === '1');
const int = (min: number, max: number) => z.coerce.number().int().min(min).max(max);

/**
 * Every environment variable the API reads, with its default. README.md lists the same
 * table for operators; keep the two equal.
 */
export const databaseEnvSchema = z.object({
  DB_HOST: z.string().min(1).default('127.0.0.1'),
  DB_PORT: int(1, 65535).default(3307),
  DB_USER: z.string().min(1).default('skyledger'),
  DB_PASSWORD: z.string().min(1),
  DB_NAME: z.string().min(1).default('skyledger'),
});

export const envSchema = databaseEnvSchema
  .extend({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    HOST: z.string().min(1).default('127.0.0.1'),
    PORT: int(0, 65535).default(3000),
    APP_URL: z.url().default('http://127.0.0.1:3000'),
    LOG_LEVEL: z
      .enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'])
      .default('info'),
    WEB_DIST_DIR: z.string().optional(),
    NEWSROOM_NAME: z.string().trim().min(1).max(120).default('Skyledger newsroom'),
    DESK_TIME_ZONE: z
      .string()
      .refine(isTimeZone, { error: 'must be an IANA time zone, e.g. Europe/London' })
      .default('UTC'),

    JWT_SECRET: z.string().min(32, { error: 'must be at least 32 characters' }),
    JWT_ACCESS_TTL_SECONDS: int(30, 86_400).default(900),
    REFRESH_TTL_DAYS: int(1, 365).default(14),
    REFRESH_REUSE_GRACE_SECONDS: int(0, 300).default(10),
    /** Defaults to true in production (see configuration.ts): cookies then need HTTPS. */
    COOKIE_SECURE: bool.optional(),
    AUTH_RATE_LIMIT_PER_MINUTE: int(1, 100_000).default(10),
    LOCKOUT_THRESHOLD: int(1, 100).default(5),
    LOCKOUT_MINUTES: int(1, 1440).default(15),
    INVITE_TTL_HOURS: int(1, 720).default(72),
    PASSWORD_RESET_TTL_MINUTES: int(5, 1440).default(60),

    SMTP_HOST: z.string().min(1).default('127.0.0.1'),
    SMTP_PORT: int(1, 65535).default(1025),
    SMTP_SECURE: bool.default(false),
    SMTP_USER: z.string().optional(),
    SMTP_PASSWORD: z.string().optional(),
    MAIL_FROM: z.string().min(3).default('Skyledger desk <desk@skyledger.test>'),
    OUTBOX_WORKER_ENABLED: bool.default(true),
    OUTBOX_POLL_MS: int(50, 600_000).default(2000),
    OUTBOX_MAX_ATTEMPTS: int(1, 100).default(8),
    OUTBOX_STALE_SECONDS: int(5, 86_400).default(120),

    SEARCH_ENGINE: z.enum(['embedded', 'meilisearch']).default('embedded'),
    MEILI_HOST: z.url().optional(),
    MEILI_API_KEY: z.string().optional(),
    MEILI_INDEX: z
      .string()
      .regex(/^[A-Za-z0-9_-]+$/, { error: 'letters, digits, - and _ only' })
      .default('skyledger'),

    PUBLISH_POLL_MS: int(100, 600_000).default(5000),
    PUBLISHER_ENABLED: bool.default(true),

    FILES_STORAGE: z.enum(['local', 's3']).default('local'),
    FILES_DIR: z.string().min(1).optional(),
    UPLOAD_MAX_BYTES: int(1, 1024 ** 3).default(20 * 1024 ** 2),
    S3_BUCKET: z.string().min(3).optional(),
    S3_REGION: z.string().min(1).default('us-east-1'),
    S3_ENDPOINT: z.url().optional(),
    S3_FORCE_PATH_STYLE: bool.default(false),
    S3_ACCESS_KEY_ID: z.string().min(1).optional(),
    S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
    S3_PREFIX: z
      .string()
      .regex(/^[A-Za-z0-9_./-]*$/, { error: 'letters, digits, ., /, - and _ only' })
      .default(''),
  })
  .refine((env) => env.SEARCH_ENGINE !== 'meilisearch' || env.MEILI_HOST, {
    error: 'is required when SEARCH_ENGINE is meilisearch',
    path: ['MEILI_HOST'],
  })
  .refine((env) => env.FILES_STORAGE !== 's3' || env.S3_BUCKET, {
    error: 'is required when FILES_STORAGE is s3',
    path: ['S3_BUCKET'],
  })
  .refine((env) => Boolean(env.S3_ACCESS_KEY_ID) === Boolean(env.S3_SECRET_ACCESS_KEY), {
    error: 'set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither',
    path: ['S3_SECRET_ACCESS_KEY'],
  });

export type Env = z.infer<typeof envSchema>;

export class InvalidEnvironmentError extends Error {}

/**
 * Validates the environment at boot. Every problem is listed at once, by variable, so an
 * operator fixes them in one go rather than one restart each.
 */
export function validateEnv(raw: Record<string, unknown>): Env {
  return parseEnv(envSchema, raw);
}

export function parseEnv<Schema extends z.ZodType>(
  schema: Schema,
  raw: Record<string, unknown>,
): z.infer<Schema> {
  const present = Object.fromEntries(
    Object.entries(raw).filter(([, value]) => value !== undefined && value !== ''),
  );
  const result = schema.safeParse(present);
  if (result.success) return result.data;
  const lines = result.error.issues.map((issue) => {
    const name = issue.path.join('.');
    const missing = present[name] === undefined;
    return `  - ${name}: ${missing ? 'is required but not set' : issue.message}`;
  });
  throw new InvalidEnvironmentError(
    `The API's configuration is incomplete or wrong:\n${lines.join('\n')}\n` +
      'Set these environment variables (see .env.example and README.md, "Configuration").',
  );
}
