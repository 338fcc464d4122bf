// `npm run serve` as a separate process, as a seminar would start it from the README:
// production has no demo accounts and prints no password; development listens on this machine
// only; the token key is random, kept owner-only in the data folder and reused after a restart,
// so a token signed with a key known from the source is refused.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { networkInterfaces, tmpdir } from 'node:os';
import { join } from 'node:path';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { DEMO_USERS } from '@/server/demo/seed';
import { startSmtpFake, type Mailbox } from '@/server/mail/smtp-fake';
import { startServer } from '@/server/server';

interface Started {
  child: ChildProcess;
  url: string;
  /** stdout and stderr so far. */
  output: () => string;
}

/** Starts server/main.ts with exactly `env` (plus PATH) and waits for its "running at" line. */
function serve(env: Record<string, string>): Promise<Started> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    env: { PATH: process.env.PATH!, TSX_TSCONFIG_PATH: 'server/tsconfig.json', PORT: '0', WEB_DIR: join(tmpdir(), 'no-web-build'), ...env },
  });
  let out = '';
  return new Promise((resolve, reject) => {
    const read = (chunk: Buffer) => {
      out += chunk;
      const url = /running at (http:\/\/localhost:\d+)/.exec(out)?.[1];
      if (url) resolve({ child, url, output: () => out });
    };
    child.stdout.on('data', read);
    child.stderr.on('data', read);
    child.once('exit', (code) => reject(new Error(`server exited with ${code}:\n${out}`)));
  });
}

function stop({ child }: Started): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null) return resolve();
    child.once('exit', () => resolve());
    child.kill('SIGTERM');
  });
}

/** Runs main.ts expecting it to refuse to start; returns what it printed. */
function refusal(env: Record<string, string>): Promise<{ code: number | null; output: string }> {
  return serve(env).then(
    async (s) => {
      await stop(s);
      throw new Error(`started although it should not:\n${s.output()}`);
    },
    (err: Error) => ({ code: Number(/exited with (\d+)/.exec(err.message)?.[1]), output: err.message }),
  );
}

const mode = (path: string) => statSync(path).mode & 0o777;
const owner = DEMO_USERS.find((u) => u.role === 'owner')!;
const signIn = (url: string, u = owner) => request(url).post('/api/auth/login').send({ email: u.email, password: u.password });
/** The key development used to ship in the source; anyone who read it could sign tokens. */
const OLD_FIXED_SECRET = 'overstrand-development-secret-do-not-use-in-production';
/** This machine's first address that is not loopback, when it has one. */
const lanAddress = Object.values(networkInterfaces())
  .flat()
  .find((a) => a && a.family === 'IPv4' && !a.internal)?.address;

let dir: string;
let mailbox: Mailbox;
beforeAll(async () => {
  mailbox = await startSmtpFake();
});
afterAll(() => mailbox.stop());
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'overstrand-start-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('a production start', () => {
  it('has no demo accounts, prints no password, keeps a generated key and owner-only files', async () => {
    const data = join(dir, 'data');
    const s = await serve({ NODE_ENV: 'production', DATABASE_PATH: join(data, 'overstrand.sqlite'), SMTP_HOST: mailbox.host, SMTP_PORT: String(mailbox.port) });
    try {
      expect((await signIn(s.url)).status).toBe(401);
      expect((await request(s.url).get('/api/dev/mail')).status).toBe(404);
      // The request log is on at info level, so the checks below look at real log lines.
      while (!s.output().includes('"url":"/api/dev/mail"')) await new Promise((r) => setTimeout(r, 50));
      const output = s.output();
      for (const u of DEMO_USERS) expect(output).not.toContain(u.password);
      expect(output).not.toMatch(/password/i);
      expect(mode(data)).toBe(0o700);
      expect(mode(join(data, 'overstrand.sqlite'))).toBe(0o600);
      expect(mode(join(data, 'jwt-secret'))).toBe(0o600);
      expect(readFileSync(join(data, 'jwt-secret'), 'utf8')).toMatch(/^[0-9a-f]{64}$/);
    } finally {
      await stop(s);
    }
  }, 60_000);

  it('refuses DEMO=1, and a bad AUTH_RATE_LIMIT, naming the variable', async () => {
    const [demo, limit] = await Promise.all([
      refusal({ NODE_ENV: 'production', DEMO: '1', DATABASE_PATH: join(dir, 'db.sqlite'), SMTP_HOST: mailbox.host }),
      refusal({ AUTH_RATE_LIMIT: 'thirty', DATABASE_PATH: join(dir, 'db.sqlite') }),
    ]);
    expect(demo.code).toBe(1);
    expect(demo.output).toContain('DEMO: the demo accounts have published passwords; never with NODE_ENV=production');
    expect(limit.output).toContain('AUTH_RATE_LIMIT: expected a number (got "thirty")');
  }, 60_000);
});

describe('a development start', () => {
  it('listens on loopback only, refuses tokens signed with the old fixed key, and reuses its kept key after a restart', async () => {
    const env = { DATABASE_PATH: join(dir, 'data', 'overstrand.sqlite') };
    const first = await serve(env);
    let token: string;
    try {
      expect(first.output()).toContain('listening on 127.0.0.1:');
      const res = await signIn(first.url); // the demo is a development feature
      expect(res.status).toBe(200);
      token = res.body.token;
      if (lanAddress) {
        const port = new URL(first.url).port;
        const err = await request(`http://${lanAddress}:${port}`).get('/api/health').then(() => null, (e: NodeJS.ErrnoException) => e);
        expect(err?.code).toBe('ECONNREFUSED');
      }
      const forged = jwt.sign({}, OLD_FIXED_SECRET, { algorithm: 'HS256', subject: owner.id, expiresIn: '1h' });
      const me = await request(first.url).get('/api/me').set('Authorization', `Bearer ${forged}`);
      expect(me.status).toBe(401);
    } finally {
      await stop(first);
    }
    const key = readFileSync(join(dir, 'data', 'jwt-secret'), 'utf8');
    const second = await serve(env);
    try {
      expect((await request(second.url).get('/api/me').set('Authorization', `Bearer ${token}`)).body).toMatchObject({ email: owner.email });
      expect(readFileSync(join(dir, 'data', 'jwt-secret'), 'utf8')).toBe(key);
    } finally {
      await stop(second);
    }
  }, 90_000);
});

describe('the kept-mail pages', () => {
  it('answer loopback only, even on a server listening on every interface', async () => {
    const server = await startServer({ host: '0.0.0.0' });
    try {
      expect((await request(`http://127.0.0.1:${server.port}`).get('/api/dev/mail')).status).toBe(200);
      // Forwarded headers do not make a remote caller local.
      if (lanAddress) {
        const remote = `http://${lanAddress}:${server.port}`;
        expect((await request(remote).get('/api/dev/mail').set('X-Forwarded-For', '127.0.0.1')).status).toBe(404);
        expect((await request(remote).get('/dev/mail')).status).toBe(404);
        expect((await request(remote).get('/api/health')).status).toBe(200); // the rest of the API answers
      }
    } finally {
      await server.stop();
    }
  });
});
