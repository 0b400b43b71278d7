import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { z } from 'zod';

/** Repository root: the nearest folder above this file that holds nest-cli.json. */
export const REPO_ROOT = findRepoRoot(__dirname);

function findRepoRoot(from: string): string {
  let dir = from;
  while (!existsSync(resolve(dir, 'nest-cli.json'))) {
    const up = dirname(dir);
    if (up === dir) return process.cwd();
    dir = up;
  }
  return dir;
}

const bool = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

const EnvSchema = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  DATABASE_PATH: z.string().default(resolve(REPO_ROOT, 'data/benchproof.sqlite')),
  UPLOADS_DIR: z.string().default(resolve(REPO_ROOT, 'uploads')),
  WEB_DIST: z.string().default(resolve(REPO_ROOT, 'dist/apps/web')),
  JWT_SECRET: z.string().min(32).optional(),
  SESSION_TTL_SECONDS: z.coerce
    .number()
    .int()
    .positive()
    .default(8 * 3600),
  SEED_DEMO: bool.default(true),
  COOKIE_SECURE: bool.default(false),
  /** Failed sign-ins allowed per account, and per address, within the window. */
  LOGIN_THROTTLE_LIMIT: z.coerce.number().int().positive().default(10),
  LOGIN_THROTTLE_ADDRESS_LIMIT: z.coerce.number().int().positive().default(50),
  LOGIN_THROTTLE_WINDOW_SECONDS: z.coerce
    .number()
    .int()
    .positive()
    .default(15 * 60),
  /** Password-reset links one typed address, and one client address, may ask for within the window. */
  RESET_THROTTLE_LIMIT: z.coerce.number().int().positive().default(5),
  RESET_THROTTLE_ADDRESS_LIMIT: z.coerce.number().int().positive().default(20),
  RESET_THROTTLE_WINDOW_SECONDS: z.coerce.number().int().positive().default(3600),
  /** 'open' lets new workshops sign themselves up (hosted service); 'closed' (default) allows only first-run setup. */
  SIGNUP: z.enum(['open', 'closed']).default('closed'),
  /** Sign-ups one client address may start within an hour (SIGNUP=open). */
  SIGNUP_LIMIT: z.coerce.number().int().positive().default(5),
  /** The one-time first-run setup code; unset: a random one is printed at start while the database has no shop. */
  SETUP_CODE: z.string().min(8).optional(),
  /** Express 'trust proxy' (e.g. `loopback`, `1`, `10.0.0.0/8`). Unset: X-Forwarded-For is ignored. */
  TRUST_PROXY: z.string().min(1).optional(),
  /** `production` refuses to start without PUBLIC_URL (owner links and report links are built from it, never from a request). */
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PUBLIC_URL: z.string().url().optional(),
  /** The origin the web app is served from; the only one allowed cross-origin (tus CORS). Default: PUBLIC_URL's origin, else http://localhost:PORT. */
  APP_ORIGIN: z.string().url().optional(),
  /** smtp://host:port (STARTTLS when offered), smtps:// for TLS from the start, user:pass@ for auth. */
  SMTP_URL: z
    .string()
    .regex(/^smtps?:\/\//, 'must start with smtp:// or smtps://')
    .default('smtp://127.0.0.1:1025'),
  MAIL_FROM: z.string().default('BenchProof <reports@benchproof.localhost>'),
  MAIL_CATCHER: bool.default(true),
  /** Reports larger than this go as a link instead of an attachment (many providers refuse 10-25 MB). */
  MAIL_ATTACHMENT_BUDGET: z.coerce
    .number()
    .int()
    .positive()
    .default(8 * 1024 * 1024),
  /** First retry of a 'mail.send' task after this many ms; the task runner's backoff doubles it (capped at 10 min). */
  MAIL_RETRY_BASE_MS: z.coerce.number().int().positive().default(30_000),
  MAIL_MAX_ATTEMPTS: z.coerce.number().int().positive().default(8),
  /** Card payments (the provider's SDK). The defaults reach the local fake (`npm start` runs it on 12111). */
  STRIPE_SECRET_KEY: z.string().min(1).default('sk_test_local_fake'),
  STRIPE_WEBHOOK_SECRET: z.string().min(1).default('whsec_local_fake'),
  /** Where the SDK sends its API calls (host, port and protocol); 'provider' = the SDK's own default host. */
  STRIPE_API_URL: z.union([z.string().url(), z.literal('provider')]).default('http://127.0.0.1:12111'),
  PAYMENT_FAKE: bool.default(true),
  /** Text messages (the provider's SDK). The defaults reach the local fake (`npm start` runs it on 12112). */
  TWILIO_ACCOUNT_SID: z.string().min(1).default('AC00000000000000000000000000000000'),
  TWILIO_AUTH_TOKEN: z.string().min(1).default('local_fake_auth_token'),
  /** The sender: a number in E.164 or a messaging service id. */
  TWILIO_FROM: z.string().min(1).default('+15005550006'),
  /** Where the SDK's custom httpClient sends its requests; 'provider' = the SDK's own default client and hosts. */
  TWILIO_API_URL: z.union([z.string().url(), z.literal('provider')]).default('http://127.0.0.1:12112'),
  TEXT_FAKE: bool.default(true),
  TEXT_MAX_ATTEMPTS: z.coerce.number().int().positive().default(6),
  TEXT_RETRY_BASE_MS: z.coerce.number().int().positive().default(30_000),
  MAX_PHOTO_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(40 * 1024 * 1024),
  MAX_VIDEO_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(4 * 1024 * 1024 * 1024),
  MAX_IMAGE_PIXELS: z.coerce.number().int().positive().default(100_000_000),
  /** Background tasks (infra/tasks): 'sqlite' (default, in this process) or 'redis' (BullMQ on REDIS_URL; the tasks table stays the outbox). */
  TASKS: z.enum(['sqlite', 'redis']).optional(),
  /** The older name of TASKS; TASKS wins when both are set. */
  TASKS_DRIVER: z.enum(['sqlite', 'redis']).default('sqlite'),
  /** redis://[user:pass@]host:port[/db]: shared state of several API processes (tasks, live updates, rate limits). Unset: everything in this process. */
  REDIS_URL: z
    .string()
    .regex(/^rediss?:\/\//, 'must start with redis:// or rediss://')
    .optional(),
  /** Prefix of every Redis key and channel of this deployment (two deployments may share one Redis). */
  REDIS_PREFIX: z.string().min(1).default('benchproof'),
  /** API processes serving one port (node:cluster); above 1 needs REDIS_URL. */
  WEB_CONCURRENCY: z.coerce.number().int().min(1).max(64).default(1),
  TASK_POLL_MS: z.coerce.number().int().positive().default(1000),
  TASK_LEASE_MS: z.coerce.number().int().min(300).default(60_000),
  TASK_BACKOFF_MS: z.coerce.number().int().positive().default(2000),
  /** After the last quick attempt, a task failed on a transient error (full disk, lost connection, timeout) runs again after this, doubling up to a day. */
  TASK_RETRY_LATER_MS: z.coerce
    .number()
    .int()
    .positive()
    .default(15 * 60_000),
  /**
   * Photos made into derivatives at once. Two on the 2-core target: 20 photos 4 at a time went from 2.78 to
   * 3.82 photos/s against one (npm run bench), at the cost of ~40 MB more idle RSS after the burst.
   */
  DERIVATIVES_CONCURRENCY: z.coerce.number().int().min(1).max(16).default(2),
  /** Memory for the bytes of recently served thumb/screen derivatives (0 turns the cache off); files over 1 MB are never kept. */
  MEDIA_CACHE_MB: z.coerce.number().min(0).default(32),
  /** Unfinished resumable uploads expire after this many hours (tus expiration extension). */
  TUS_EXPIRE_HOURS: z.coerce.number().positive().default(24),
  /** Where media, reports and backups live: 'local' (UPLOADS_DIR) or 's3' (an S3-compatible bucket, S3_* below). */
  STORAGE: z.enum(['local', 's3']).default('local'),
  S3_BUCKET: z.string().min(3).optional(),
  S3_REGION: z.string().min(1).default('us-east-1'),
  /** For an S3-compatible store (MinIO, Ceph, a local fake); unset = AWS. */
  S3_ENDPOINT: z.string().url().optional(),
  S3_FORCE_PATH_STYLE: bool.default(false),
  /** Both or neither; neither = the AWS SDK's default credential chain (environment, shared files, instance role). */
  S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
  /** A database backup every this many hours (0 = only on demand); the newest BACKUP_KEEP are kept. */
  BACKUP_EVERY_HOURS: z.coerce.number().min(0).default(24),
  BACKUP_KEEP: z.coerce.number().int().min(1).default(14),
  STORAGE_SWEEP_MINUTES: z.coerce.number().positive().default(60),
  /** A stored original that no media row names is removed by the sweep once it is this old (an upload in flight has no row yet). */
  ORPHAN_GRACE_MINUTES: z.coerce.number().positive().default(60),
  /** Readiness reports `low` (and managers see a warning) when the database's or the uploads' disk has less free space than this. */
  DISK_LOW_MB: z.coerce.number().min(0).default(1024),
  /**
   * Prometheus metrics, off unless one is set. METRICS_PORT: a second listener on METRICS_HOST (loopback by default)
   * serving GET /metrics; METRICS_TOKEN: GET /api/metrics on the main port with `Authorization: Bearer <token>`
   * (with METRICS_PORT too, that listener asks for the token as well). Never public: no token, no port, no endpoint.
   */
  METRICS_PORT: z.coerce.number().int().min(0).max(65535).optional(),
  METRICS_HOST: z.string().default('127.0.0.1'),
  METRICS_TOKEN: z.string().min(24, 'METRICS_TOKEN must be at least 24 characters').optional(),
  /** On SIGTERM: how long in-flight requests and running tasks get to finish before they are cut off (ms). */
  SHUTDOWN_GRACE_MS: z.coerce.number().int().min(0).default(10_000),
  /** pino level; 'silent' turns request logs off (tests). */
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
});

/** Every environment variable the config reads (DEVELOPERS.md lists each one; a spec checks). */
export const SETTING_NAMES: readonly string[] = Object.keys(EnvSchema.shape);

export type AppConfig = z.infer<typeof EnvSchema> & {
  jwtSecret: string;
  appOrigin: string;
  /** Where links in e-mails and PDFs point: PUBLIC_URL, else (development and test only) http://localhost:PORT. No trailing slash. */
  publicUrl: string;
};

export const APP_CONFIG = Symbol('APP_CONFIG');

/** A configuration the server must not start with; main.ts prints its message alone and exits. */
export class ConfigError extends Error {}

/**
 * Reads the environment once. Without JWT_SECRET a random secret is kept beside
 * the database so sessions survive a restart of the demo.
 */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = EnvSchema.safeParse(env);
  if (!parsed.success) {
    throw new ConfigError(`Invalid environment: ${z.prettifyError(parsed.error)}`);
  }
  const cfg = parsed.data;
  if (cfg.STORAGE === 's3' && !cfg.S3_BUCKET) throw new Error('Invalid environment: STORAGE=s3 needs S3_BUCKET');
  if (!cfg.S3_ACCESS_KEY_ID !== !cfg.S3_SECRET_ACCESS_KEY)
    throw new Error('Invalid environment: set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither');
  if (cfg.NODE_ENV === 'production' && !cfg.PUBLIC_URL) {
    throw new ConfigError(
      'PUBLIC_URL is required when NODE_ENV=production: owner links and report links are built from it. ' +
        'Set it to the address customers open, e.g. PUBLIC_URL=https://workshop.example.com',
    );
  }
  checkSharedState(cfg);
  const publicUrl = (cfg.PUBLIC_URL ?? `http://localhost:${cfg.PORT}`).replace(/\/+$/, '');
  const appOrigin = new URL(cfg.APP_ORIGIN ?? publicUrl).origin;
  return { ...cfg, TASKS_DRIVER: cfg.TASKS ?? cfg.TASKS_DRIVER, jwtSecret: cfg.JWT_SECRET ?? secretBeside(cfg.DATABASE_PATH), appOrigin, publicUrl };
}

/** Several processes share tasks, live updates and rate limits only through Redis; refuse a setup that would split them silently. */
function checkSharedState(cfg: z.infer<typeof EnvSchema>): void {
  if ((cfg.TASKS ?? cfg.TASKS_DRIVER) === 'redis' && !cfg.REDIS_URL)
    throw new ConfigError('TASKS=redis needs REDIS_URL (e.g. REDIS_URL=redis://127.0.0.1:6379).');
  if (cfg.WEB_CONCURRENCY > 1 && !cfg.REDIS_URL) {
    throw new ConfigError(
      `WEB_CONCURRENCY=${cfg.WEB_CONCURRENCY} needs REDIS_URL: with several API processes, live updates to staff and rate limits must be shared ` +
        'through Redis, or each process would see only its own. Set REDIS_URL (and TASKS=redis), or leave WEB_CONCURRENCY at 1.',
    );
  }
}

function secretBeside(databasePath: string): string {
  if (databasePath === ':memory:') return randomBytes(32).toString('hex');
  const file = resolve(dirname(databasePath), '.session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dirname(file), { recursive: true });
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
