// The environment goes through one schema (server/config.ts): defaults per mode, every bad
// value refused at start with the variable's name, and the settings a reverse proxy needs.
import { defaultRunLimits } from '@/server/runs/limits';
import { settingsFromEnv, workerSettingsFromEnv } from '@/server/config';

const production = { NODE_ENV: 'production', SMTP_HOST: 'mail.example.org' };

describe('settings from the environment', () => {
  it('development: this machine only, demo on, development pages on', () => {
    const s = settingsFromEnv({});
    expect(s).toMatchObject({ production: false, host: '127.0.0.1', port: 8080, demo: true, dbPath: 'data/overstrand.sqlite' });
    expect(s.config).toMatchObject({ devPages: true, trustProxy: false, webDir: 'dist', runs: defaultRunLimits() });
    expect(s.config.jwtSecret).toBeUndefined(); // made and kept in the data folder at start (auth/secret.ts)
  });

  it('production: every interface, no demo, no development pages, STARTTLS-capable relay with credentials', () => {
    const s = settingsFromEnv({ ...production, SMTP_PORT: '2525', SMTP_USER: 'robot', SMTP_PASSWORD: 'pw' });
    expect(s).toMatchObject({ production: true, host: '0.0.0.0', demo: false, smtp: { host: 'mail.example.org', port: 2525, auth: { user: 'robot', pass: 'pw' } } });
    expect(s.config.devPages).toBe(false);
    expect(settingsFromEnv({ ...production, HOST: '10.1.2.3' }).host).toBe('10.1.2.3');
    expect(settingsFromEnv({ HOST: '0.0.0.0', DEMO: '0' })).toMatchObject({ host: '0.0.0.0', demo: false });
  });

  it('reads the run limits, photo storage, rate limit and proxy setting', () => {
    const s = settingsFromEnv({
      RUN_THREADS: '3', RUN_MAX_CROSSINGS: '90', RUN_MAX_MINUTES: '2', RUN_MAX_MEMORY_MB: '512',
      S3_BUCKET: 'boards', S3_ENDPOINT: 'http://127.0.0.1:9000', AUTH_RATE_LIMIT: '12', TRUST_PROXY: 'loopback, 10.0.0.0/8',
      PUBLIC_URL: 'https://knots.example.org/', JWT_SECRET: 'x'.repeat(32),
    });
    expect(s.config.runs).toMatchObject({ threads: 3, maxCrossings: 90, maxWallMs: 120_000, maxMemoryMb: 512 });
    expect(s.config.photos).toEqual({ kind: 's3', bucket: 'boards', endpoint: 'http://127.0.0.1:9000', region: 'us-east-1', accessKeyId: undefined, secretAccessKey: undefined, forcePathStyle: true });
    expect(s.config).toMatchObject({ authRateLimit: { limit: 12 }, trustProxy: ['loopback', '10.0.0.0/8'], publicUrl: 'https://knots.example.org', jwtSecret: 'x'.repeat(32) });
    expect(settingsFromEnv({ TRUST_PROXY: '1' }).config.trustProxy).toBe(1);
    expect(settingsFromEnv({ PHOTO_DIR: '/srv/photos', PORT: '' }).config.photos).toEqual({ kind: 'disk', dir: '/srv/photos' });
  });

  it('computes runs itself unless REDIS_URL names the queue; reads the per-person run quota', () => {
    expect(settingsFromEnv({}).config.redisUrl).toBeNull();
    const s = settingsFromEnv({ REDIS_URL: 'redis://queue.example.org:6379', RUN_MAX_QUEUED_PER_USER: '12' });
    expect(s.config.redisUrl).toBe('redis://queue.example.org:6379');
    expect(s.config.runs!.maxLivePerUser).toBe(12);
  });

  it('a queue worker needs REDIS_URL and reads its threads, heap limit, name and lock time', () => {
    expect(() => workerSettingsFromEnv({})).toThrow("REDIS_URL: must be set: the Redis of the server's run queue");
    expect(workerSettingsFromEnv({ REDIS_URL: 'redis://q:6379', RUN_THREADS: '2', RUN_MAX_MEMORY_MB: '512', WORKER_NAME: 'lab-3', WORKER_LOCK_SECONDS: '10' })).toEqual({
      redisUrl: 'redis://q:6379', threads: 2, maxMemoryMb: 512, name: 'lab-3', lockMs: 10_000,
    });
    expect(workerSettingsFromEnv({ REDIS_URL: 'redis://q:6379' })).toMatchObject({ threads: defaultRunLimits().threads, name: undefined, lockMs: 30_000 });
  });

  it.each([
    [{ AUTH_RATE_LIMIT: 'lots' }, 'AUTH_RATE_LIMIT: expected a number (got "lots")'],
    [{ AUTH_RATE_LIMIT: '0' }, 'AUTH_RATE_LIMIT: must be at least 1 (got "0")'],
    [{ RUN_THREADS: 'many' }, 'RUN_THREADS: expected a number (got "many")'],
    [{ RUN_THREADS: '1.5' }, 'RUN_THREADS: expected a whole number (got "1.5")'],
    [{ PORT: '70000' }, 'PORT: must be at most 65535 (got "70000")'],
    [{ TRUST_PROXY: 'true' }, 'TRUST_PROXY: expected false, a number of proxy hops'],
    [{ TRUST_PROXY: '10.0.0.0/8,nonsense' }, 'TRUST_PROXY: expected false'],
    [{ DEMO: 'yes' }, 'DEMO: expected 1, 0, true or false'],
    [{ PUBLIC_URL: 'knots.example.org' }, 'PUBLIC_URL: expected an http(s) URL'],
    [{ JWT_SECRET: 'short' }, 'JWT_SECRET: must be at least 32 characters'],
    [{ NODE_ENV: 'production' }, 'SMTP_HOST: must be set when NODE_ENV=production'],
    [{ ...production, DEMO: '1' }, 'DEMO: the demo accounts have published passwords'],
    [{ SMTP_HOST: 'relay', SMTP_USER: 'robot' }, 'SMTP_USER: SMTP_USER and SMTP_PASSWORD go together'],
    [{ REDIS_URL: 'http://queue:6379' }, 'REDIS_URL: expected a redis:// or rediss:// URL'],
    [{ RUN_MAX_QUEUED_PER_USER: '0' }, 'RUN_MAX_QUEUED_PER_USER: must be at least 1'],
  ])('refuses %j with a message naming the variable', (env, message) => {
    expect(() => settingsFromEnv(env)).toThrow(message);
  });

  it('names every bad variable at once and never echoes a secret', () => {
    const run = () => settingsFromEnv({ PORT: 'x', RUN_MAX_MINUTES: '-1', JWT_SECRET: 'hunter2', REDIS_URL: 'http://:hunter3@queue' });
    expect(run).toThrow(/Bad environment settings:\n {2}PORT: .*\n {2}JWT_SECRET: .*\n {2}RUN_MAX_MINUTES: /);
    expect(run).not.toThrow(/hunter2|hunter3/);
  });
});
