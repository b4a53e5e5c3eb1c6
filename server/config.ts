import { z } from 'zod';

const bool = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

/** The development default; production refuses it (npm start generates a real one in .data/secrets.json). */
export const DEFAULT_SESSION_SECRET = 'dev-only-session-secret-change-me';

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    HOST: z.string().default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(3000),
    PUBLIC_URL: z.string().url().optional(),
    DB_HOST: z.string().default('127.0.0.1'),
    DB_PORT: z.coerce.number().int().default(3307),
    DB_NAME: z.string().default('scanwright'),
    DB_USER: z.string().default('scanwright'),
    DB_PASSWORD: z.string().default(''),
    DB_POOL_MAX: z.coerce.number().int().min(1).default(10),
    SESSION_SECRET: z.string().min(16).default(DEFAULT_SESSION_SECRET),
    GITHUB_CLIENT_ID: z.string().optional(),
    GITHUB_CLIENT_SECRET: z.string().optional(),
    OAUTH_STANDIN_PORT: z.coerce.number().int().default(3001),
    ADMIN_LOGINS: z.string().default(''),
    SMTP_URL: z.string().optional(),
    SMTP_CATCHER_PORT: z.coerce.number().int().default(2525),
    INBOX_PORT: z.coerce.number().int().default(3025),
    /** `external`: the OAuth stand-in and SMTP catcher run once elsewhere (npm run cluster), not in each instance. */
    STAND_INS: z.enum(['auto', 'external']).default('auto'),
    MAIL_FROM: z.string().default('Scanwright <no-reply@scanwright.local>'),
    UPLOADS_DIR: z.string().default('uploads'),
    S3_BUCKET: z.string().trim().optional(),
    S3_ENDPOINT: z.string().url().optional(),
    S3_REGION: z.string().default('us-east-1'),
    S3_ACCESS_KEY_ID: z.string().optional(),
    S3_SECRET_ACCESS_KEY: z.string().optional(),
    S3_PREFIX: z.string().default(''),
    CLIENT_DIST: z.string().default('dist/client'),
    RATE_LIMITS: bool.default(true),
    /** Proxies in front of the app whose X-Forwarded-For is believed (npm run cluster: haproxy, 1). */
    TRUST_PROXY: z.coerce.number().int().min(0).max(5).default(0),
    RATE_LIMIT_STORE: z.enum(['memory', 'mariadb']).default('memory'),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
    READY_MIN_FREE_MB: z.coerce.number().min(0).default(200),
    READY_MAX_OUTBOX: z.coerce.number().int().min(1).default(500),
    METRICS_TOKEN: z.string().min(16).optional(),
    OUTBOX_LEASE_S: z.coerce.number().int().min(1).default(120),
    SMTP_TIMEOUT_S: z.coerce.number().min(0.1).default(10),
  })
  .refine((e) => e.NODE_ENV !== 'production' || e.SESSION_SECRET !== DEFAULT_SESSION_SECRET, {
    path: ['SESSION_SECRET'],
    message: 'SESSION_SECRET must be set in production: the development default would let anyone forge a session cookie.',
  });

export type Env = z.infer<typeof envSchema>;

export interface Config {
  env: Env['NODE_ENV'];
  host: string;
  port: number;
  publicUrl: string;
  db: { host: string; port: number; name: string; user: string; password: string; poolMax: number };
  sessionSecret: string;
  /** Real GitHub when both are set; otherwise the local OAuth stand-in. */
  github: { clientId: string; clientSecret: string; baseUrl: string; apiUrl: string; standIn: boolean };
  adminLogins: string[];
  /** smtp:// URL of the mail relay; the local catcher when unset. */
  smtpUrl: string | null;
  mailFrom: string;
  uploadsDir: string;
  /** Photo files in an S3-compatible bucket instead of `uploadsDir` (S3_BUCKET set; S3_ENDPOINT for anything but AWS). */
  s3: {
    bucket: string;
    endpoint: string | null;
    region: string;
    accessKeyId: string | null;
    secretAccessKey: string | null;
    prefix: string;
  } | null;
  clientDist: string;
  rateLimits: boolean;
  /** Hops of X-Forwarded-For to trust for the client address (0: none; behind HTTPS at least 1). */
  trustProxy: number;
  /** Where limit counts live: this process's memory, or MariaDB (shared by every instance on the database). */
  rateLimitStore: 'memory' | 'mariadb';
  logLevel: string;
  /** /api/ready bounds (uploads disk free space, unsent mails) and the /metrics bearer token (loopback only when null). */
  ops: { readyMinFreeMb: number; readyMaxOutbox: number; metricsToken: string | null };
  /** How long a worker's claim on a mail holds, and the SMTP connection, greeting and socket timeouts. */
  outbox: { leaseS: number; smtpTimeoutMs: number };
}

/** Parse the environment once, with defaults that fit the embedded set-up. */
export function loadConfig(source: NodeJS.ProcessEnv = process.env, overrides: Partial<Config> = {}): Config {
  const e = envSchema.parse(source);
  const standIn = !(e.GITHUB_CLIENT_ID && e.GITHUB_CLIENT_SECRET);
  const standInBase = `http://127.0.0.1:${e.OAUTH_STANDIN_PORT}`;
  const config: Config = {
    env: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    publicUrl: e.PUBLIC_URL ?? `http://${e.HOST === '0.0.0.0' ? '127.0.0.1' : e.HOST}:${e.PORT}`,
    db: { host: e.DB_HOST, port: e.DB_PORT, name: e.DB_NAME, user: e.DB_USER, password: e.DB_PASSWORD, poolMax: e.DB_POOL_MAX },
    sessionSecret: e.SESSION_SECRET,
    github: standIn
      ? { clientId: 'scanwright-local', clientSecret: 'scanwright-local-secret', baseUrl: standInBase, apiUrl: standInBase, standIn }
      : {
          clientId: e.GITHUB_CLIENT_ID!,
          clientSecret: e.GITHUB_CLIENT_SECRET!,
          baseUrl: 'https://github.com',
          apiUrl: 'https://api.github.com',
          standIn,
        },
    adminLogins: e.ADMIN_LOGINS.split(',')
      .map((s) => s.trim().toLowerCase())
      .filter(Boolean),
    smtpUrl: e.SMTP_URL ?? null,
    mailFrom: e.MAIL_FROM,
    uploadsDir: e.UPLOADS_DIR,
    s3: e.S3_BUCKET
      ? {
          bucket: e.S3_BUCKET,
          endpoint: e.S3_ENDPOINT ?? null,
          region: e.S3_REGION,
          accessKeyId: e.S3_ACCESS_KEY_ID ?? null,
          secretAccessKey: e.S3_SECRET_ACCESS_KEY ?? null,
          prefix: e.S3_PREFIX.replace(/^\/+/, '').replace(/([^/])$/, '$1/'),
        }
      : null,
    clientDist: e.CLIENT_DIST,
    rateLimits: e.RATE_LIMITS,
    trustProxy: e.TRUST_PROXY,
    rateLimitStore: e.RATE_LIMIT_STORE,
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === 'test' ? 'silent' : 'info'),
    ops: { readyMinFreeMb: e.READY_MIN_FREE_MB, readyMaxOutbox: e.READY_MAX_OUTBOX, metricsToken: e.METRICS_TOKEN ?? null },
    outbox: { leaseS: e.OUTBOX_LEASE_S, smtpTimeoutMs: Math.round(e.SMTP_TIMEOUT_S * 1000) },
  };
  return { ...config, ...overrides };
}

/** Ports the local stand-ins listen on when no real service is configured. */
export function standInPorts(source: NodeJS.ProcessEnv = process.env) {
  const e = envSchema.parse(source);
  return { oauth: e.OAUTH_STANDIN_PORT, smtp: e.SMTP_CATCHER_PORT, inbox: e.INBOX_PORT, external: e.STAND_INS === 'external' };
}
