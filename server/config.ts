// Everything the server reads from the environment, in one place: one zod schema (EnvSchema)
// checks every variable, settingsFromEnv() turns it into start options, and Config carries the
// defaults tests and development start from. README.md lists the variables.
import { isIP } from 'node:net';
import { z } from 'zod';
import type { SmtpTarget } from './mail/mailer';
import { defaultMailPacing, type MailPacing } from './notifications/pacer';
import type { PhotoStorage } from './photos/store';
import { defaultJobLimits, type JobLimits } from './jobs/pool';
import { defaultRunLimits, type RunLimits } from './runs/limits';

export interface Config {
  /** Base URL links in e-mails point to, e.g. http://localhost:8080 (no trailing slash). */
  publicUrl: string;
  /** HS256 key of the access tokens; startServer() fills an empty one from the data folder (auth/secret.ts). */
  jwtSecret: string;
  /** jsonwebtoken expiresIn, e.g. '7d'. */
  tokenTtl: string;
  bcryptRounds: number;
  invitationTtlMs: number;
  /** Failed sign-ins and sign-ups per client address, and failed sign-ins per account, in one window. */
  authRateLimit: { windowMs: number; limit: number };
  /** Express 'trust proxy': false (direct), a hop count, or the proxies' addresses / subnets. */
  trustProxy: boolean | number | string[];
  /** express.json limit, e.g. '256kb'. */
  jsonLimit: string;
  /** Development pages (/dev/mail, /api/dev/mail); never in production. */
  devPages: boolean;
  /** Exported web build to serve (dist/), or null for API only. */
  webDir: string | null;
  mailFrom: string;
  /** Limits of heavy runs and the size of their worker pool. */
  runs: RunLimits;
  /** The job pool of short computations off the request thread (feed summaries, cables, keys). */
  jobs: JobLimits;
  /** Redis of the BullMQ run queue (runs/queue/bullmq.ts); null: the server's own pool computes. */
  redisUrl: string | null;
  /** Where board photos are kept: a local folder, or an S3-compatible bucket. */
  photos: PhotoStorage;
  /** Comments one person may post per window (then 429). */
  commentRateLimit: { windowMs: number; limit: number };
  /** How notification e-mail to one person is paced into digests (notifications/pacer.ts). */
  mailPacing: MailPacing;
}

export function defaultConfig(overrides: Partial<Config> = {}): Config {
  return {
    publicUrl: 'http://localhost:8080',
    jwtSecret: '',
    tokenTtl: '7d',
    bcryptRounds: 10,
    invitationTtlMs: 7 * 24 * 3600 * 1000,
    authRateLimit: { windowMs: 15 * 60 * 1000, limit: 30 },
    trustProxy: false,
    jsonLimit: '256kb',
    devPages: true,
    webDir: null,
    mailFrom: 'Overstrand <no-reply@overstrand.invalid>',
    runs: defaultRunLimits(),
    jobs: defaultJobLimits(),
    redisUrl: null,
    photos: { kind: 'disk', dir: 'data/photos' },
    commentRateLimit: { windowMs: 60_000, limit: 20 },
    mailPacing: defaultMailPacing(),
    ...overrides,
  };
}

// An empty variable counts as unset, so `FOO= npm run serve` falls back to the default.
const optional = <S extends z.ZodType>(schema: S) => z.preprocess((v) => (v === '' ? undefined : v), schema.optional());
const number = () => z.coerce.number<string>({ error: (i) => (i.code === 'invalid_type' ? 'expected a number' : undefined) });
const whole = (min: number, max = Number.MAX_SAFE_INTEGER) =>
  optional(number().int('expected a whole number').min(min, `must be at least ${min}`).max(max, `must be at most ${max}`));
const positive = optional(number().positive('must be more than 0'));
const flag = optional(z.enum(['1', '0', 'true', 'false'], { error: 'expected 1, 0, true or false' }).transform((v) => v === '1' || v === 'true'));

const PROXY_NAMES = ['loopback', 'linklocal', 'uniquelocal'];
const isProxyAddress = (s: string) => {
  const [ip, bits, ...rest] = s.split('/');
  return PROXY_NAMES.includes(s) || (isIP(ip) !== 0 && rest.length === 0 && (bits === undefined || /^\d{1,3}$/.test(bits)));
};
/** 'false', a hop count, or a comma list of addresses, subnets and express's names (never 'true': that trusts anyone's X-Forwarded-For). */
const trustProxy = optional(
  z.string().transform((v, ctx): Config['trustProxy'] => {
    if (v === 'false') return false;
    if (/^\d+$/.test(v)) return Number(v);
    const list = v.split(',').map((s) => s.trim());
    if (list.every(isProxyAddress)) return list;
    ctx.addIssue({ code: 'custom', message: 'expected false, a number of proxy hops, or proxy addresses/subnets separated by commas (loopback, 10.0.0.0/8, ...)' });
    return z.NEVER;
  }),
);

const redisUrl = z.url({ protocol: /^rediss?$/, error: 'expected a redis:// or rediss:// URL' });

/** What the server and a queue worker (`npm run worker`) both read. */
const runFields = {
  RUN_THREADS: whole(1),
  RUN_MAX_MEMORY_MB: whole(1),
};

export const EnvSchema = z
  .object({
    ...runFields,
    NODE_ENV: optional(z.string()),
    PORT: whole(0, 65535),
    HOST: optional(z.string()),
    DATABASE_PATH: optional(z.string()),
    PUBLIC_URL: optional(z.url({ protocol: /^https?$/, error: 'expected an http(s) URL' })),
    JWT_SECRET: optional(z.string().min(32, 'must be at least 32 characters (e.g. openssl rand -hex 32)')),
    SMTP_HOST: optional(z.string()),
    SMTP_PORT: whole(1, 65535),
    SMTP_USER: optional(z.string()),
    SMTP_PASSWORD: optional(z.string()),
    MAIL_FROM: optional(z.string()),
    AUTH_RATE_LIMIT: whole(1),
    COMMENT_RATE_LIMIT: whole(1),
    TRUST_PROXY: trustProxy,
    WEB_DIR: optional(z.string()),
    DEMO: flag,
    RUN_MAX_CROSSINGS: whole(1),
    RUN_MAX_MINUTES: positive,
    RUN_MAX_QUEUED_PER_USER: whole(1),
    REDIS_URL: optional(redisUrl),
    PHOTO_DIR: optional(z.string()),
    S3_BUCKET: optional(z.string()),
    S3_ENDPOINT: optional(z.url({ error: 'expected a URL' })),
    S3_REGION: optional(z.string()),
    S3_ACCESS_KEY_ID: optional(z.string()),
    S3_SECRET_ACCESS_KEY: optional(z.string()),
    S3_FORCE_PATH_STYLE: flag,
  })
  .superRefine((env, ctx) => {
    const production = env.NODE_ENV === 'production';
    if (production && !env.SMTP_HOST) ctx.addIssue({ code: 'custom', path: ['SMTP_HOST'], message: 'must be set when NODE_ENV=production (a real mail relay)' });
    if (production && env.DEMO) ctx.addIssue({ code: 'custom', path: ['DEMO'], message: 'the demo accounts have published passwords; never with NODE_ENV=production' });
    if (!env.SMTP_USER !== !env.SMTP_PASSWORD) ctx.addIssue({ code: 'custom', path: ['SMTP_USER'], message: 'SMTP_USER and SMTP_PASSWORD go together' });
  });

/** What `npm run serve` starts from (main.ts passes it to startServer()). */
export interface Settings {
  production: boolean;
  port: number;
  host: string;
  dbPath: string;
  smtp?: SmtpTarget;
  /** Load the demo scenario (development default; never in production). */
  demo: boolean;
  config: Partial<Config>;
}

/** Never echoed in an error (a Redis URL may carry its password). */
const SECRETS = ['JWT_SECRET', 'SMTP_PASSWORD', 'REDIS_URL'];

/** Parses the environment; throws one Error naming every bad variable and why. */
function parseEnv<S extends z.ZodType>(schema: S, raw: NodeJS.ProcessEnv): z.infer<S> {
  const parsed = schema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const lines = parsed.error.issues.map((i) => {
    const name = String(i.path[0] ?? '');
    const got = name in raw ? ` (got ${JSON.stringify(raw[name])})` : '';
    return `  ${name}: ${i.message}${SECRETS.includes(name) ? '' : got}`;
  });
  throw new Error(`Bad environment settings:\n${lines.join('\n')}`);
}

export function settingsFromEnv(raw: NodeJS.ProcessEnv): Settings {
  const env = parseEnv(EnvSchema, raw);
  const production = env.NODE_ENV === 'production';
  const runs = defaultRunLimits();
  return {
    production,
    port: env.PORT ?? 8080,
    // Development listens on this machine only; a production server is meant for the network.
    host: env.HOST ?? (production ? '0.0.0.0' : '127.0.0.1'),
    dbPath: env.DATABASE_PATH ?? 'data/overstrand.sqlite',
    smtp: env.SMTP_HOST
      ? { host: env.SMTP_HOST, port: env.SMTP_PORT ?? 587, ...(env.SMTP_USER && { auth: { user: env.SMTP_USER, pass: env.SMTP_PASSWORD! } }) }
      : undefined,
    demo: env.DEMO ?? !production,
    config: {
      devPages: !production,
      webDir: env.WEB_DIR ?? 'dist',
      trustProxy: env.TRUST_PROXY ?? false,
      ...(env.PUBLIC_URL && { publicUrl: env.PUBLIC_URL.replace(/\/+$/, '') }),
      ...(env.JWT_SECRET && { jwtSecret: env.JWT_SECRET }),
      ...(env.MAIL_FROM && { mailFrom: env.MAIL_FROM }),
      ...(env.AUTH_RATE_LIMIT && { authRateLimit: { windowMs: 15 * 60 * 1000, limit: env.AUTH_RATE_LIMIT } }),
      ...(env.COMMENT_RATE_LIMIT && { commentRateLimit: { windowMs: 60_000, limit: env.COMMENT_RATE_LIMIT } }),
      runs: {
        ...runs,
        threads: env.RUN_THREADS ?? runs.threads,
        maxCrossings: env.RUN_MAX_CROSSINGS ?? runs.maxCrossings,
        maxWallMs: env.RUN_MAX_MINUTES ? env.RUN_MAX_MINUTES * 60_000 : runs.maxWallMs,
        maxMemoryMb: env.RUN_MAX_MEMORY_MB ?? runs.maxMemoryMb,
        maxLivePerUser: env.RUN_MAX_QUEUED_PER_USER ?? runs.maxLivePerUser,
      },
      redisUrl: env.REDIS_URL ?? null,
      photos: env.S3_BUCKET
        ? {
            kind: 's3',
            bucket: env.S3_BUCKET,
            endpoint: env.S3_ENDPOINT,
            region: env.S3_REGION ?? 'us-east-1',
            accessKeyId: env.S3_ACCESS_KEY_ID,
            secretAccessKey: env.S3_SECRET_ACCESS_KEY,
            forcePathStyle: env.S3_FORCE_PATH_STYLE ?? Boolean(env.S3_ENDPOINT),
          }
        : { kind: 'disk', dir: env.PHOTO_DIR ?? 'data/photos' },
    },
  };
}

export const WorkerEnvSchema = z.object({
  ...runFields,
  REDIS_URL: z.preprocess((v) => (v === '' ? undefined : v), z.url({ protocol: /^rediss?$/, error: (i) => (i.input === undefined ? "must be set: the Redis of the server's run queue, e.g. redis://queue-host:6379" : 'expected a redis:// or rediss:// URL') })),
  WORKER_NAME: optional(z.string().max(200)),
  WORKER_LOCK_SECONDS: whole(1),
});

/** What `npm run worker` starts from (server/worker/main.ts). */
export interface WorkerSettings {
  redisUrl: string;
  threads: number;
  maxMemoryMb: number;
  /** Shown on the run page as who computed it; default host and process id. */
  name: string | undefined;
  /** A worker silent this long is taken for dead and its jobs go to another (BullMQ lockDuration). */
  lockMs: number;
}

export function workerSettingsFromEnv(raw: NodeJS.ProcessEnv): WorkerSettings {
  const env = parseEnv(WorkerEnvSchema, raw);
  const runs = defaultRunLimits();
  return {
    redisUrl: env.REDIS_URL,
    threads: env.RUN_THREADS ?? runs.threads,
    maxMemoryMb: env.RUN_MAX_MEMORY_MB ?? runs.maxMemoryMb,
    name: env.WORKER_NAME,
    lockMs: (env.WORKER_LOCK_SECONDS ?? 30) * 1000,
  };
}
