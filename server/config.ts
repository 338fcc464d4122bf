// Everything the server reads from the environment, in one place, with development defaults.
import { defaultRunLimits, runLimitsFromEnv, type RunLimits } from './runs/limits';
import { photoStorageFromEnv, type PhotoStorage } from './photos/store';

export interface Config {
  /** Base URL links in e-mails point to, e.g. http://localhost:8080 (no trailing slash). */
  publicUrl: string;
  jwtSecret: string;
  /** jsonwebtoken expiresIn, e.g. '7d'. */
  tokenTtl: string;
  bcryptRounds: number;
  invitationTtlMs: number;
  /** Per client IP, on sign-in and sign-up together. */
  authRateLimit: { windowMs: number; limit: number };
  /** express.json limit, e.g. '256kb'. */
  jsonLimit: string;
  /** Development pages (/dev/mail, /api/dev/mail); never in production. */
  devPages: boolean;
  /** Exported web build to serve (dist/), or null for API only. */
  webDir: string | null;
  mailFrom: string;
  /** Limits of heavy runs and the size of their worker pool. */
  runs: RunLimits;
  /** Where board photos are kept: a local folder, or an S3-compatible bucket. */
  photos: PhotoStorage;
}

const DEV_SECRET = 'overstrand-development-secret-do-not-use-in-production';

export function defaultConfig(overrides: Partial<Config> = {}): Config {
  return {
    publicUrl: 'http://localhost:8080',
    jwtSecret: DEV_SECRET,
    tokenTtl: '7d',
    bcryptRounds: 10,
    invitationTtlMs: 7 * 24 * 3600 * 1000,
    authRateLimit: { windowMs: 15 * 60 * 1000, limit: 30 },
    jsonLimit: '256kb',
    devPages: true,
    webDir: null,
    mailFrom: 'Overstrand <no-reply@overstrand.invalid>',
    runs: defaultRunLimits(),
    photos: { kind: 'disk', dir: 'data/photos' },
    ...overrides,
  };
}

/** What `npm run serve` takes from the environment; the rest keeps its default. */
export function configFromEnv(env: NodeJS.ProcessEnv): Partial<Config> {
  const production = env.NODE_ENV === 'production';
  if (production && !env.JWT_SECRET) throw new Error('JWT_SECRET must be set when NODE_ENV=production');
  return {
    devPages: !production,
    webDir: env.WEB_DIR ?? 'dist',
    ...(env.PUBLIC_URL && { publicUrl: env.PUBLIC_URL.replace(/\/+$/, '') }),
    ...(env.JWT_SECRET && { jwtSecret: env.JWT_SECRET }),
    ...(env.MAIL_FROM && { mailFrom: env.MAIL_FROM }),
    photos: photoStorageFromEnv(env),
    runs: runLimitsFromEnv(env),
    ...(env.AUTH_RATE_LIMIT && { authRateLimit: { windowMs: 15 * 60 * 1000, limit: Number(env.AUTH_RATE_LIMIT) } }),
  };
}
