// The processes of the queue tests: a real redis-server on a free port (with the project's test
// config, tests/server/redis-test.conf) and `npm run worker` processes, each started and stopped
// by the test that needs it.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const root = join(__dirname, '..', '..');

/** A port nobody listens on just now (the OS picks it). */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

/** Resolves once the child prints `ready` on stdout; rejects with its output if it exits first. */
function started(child: ChildProcess, ready: RegExp, what: string): Promise<void> {
  let out = '';
  return new Promise((resolve, reject) => {
    const seen = (chunk: Buffer) => {
      out += chunk.toString();
      if (ready.test(out)) resolve();
    };
    child.stdout!.on('data', seen);
    child.stderr!.on('data', (chunk: Buffer) => (out += chunk.toString()));
    child.once('exit', (code, signal) => reject(new Error(`${what} exited (${code ?? signal}) before it was ready:\n${out}`)));
  });
}

function stopped(child: ChildProcess, signal: NodeJS.Signals): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    child.once('exit', () => resolve());
    child.kill(signal);
  });
}

export interface RedisProcess {
  url: string;
  /** Stops Redis as its service would (SIGTERM) and starts it again on the same port and data. */
  restart(): Promise<void>;
  stop(): Promise<void>;
}

export async function startRedis(): Promise<RedisProcess> {
  if (spawnSync('redis-server', ['--version']).error) {
    throw new Error('redis-server is not installed, and the queue tests need a real one: apt-get install -y redis-server (Debian; .ci/run does this)');
  }
  const port = await freePort();
  const dir = mkdtempSync(join(tmpdir(), 'overstrand-redis-'));
  let child: ChildProcess;
  const launch = async () => {
    child = spawn('redis-server', [join(__dirname, 'redis-test.conf'), '--port', String(port), '--dir', dir, '--loglevel', 'notice'], { stdio: ['ignore', 'pipe', 'pipe'] });
    await started(child, /Ready to accept connections/, 'redis-server');
  };
  await launch();
  return {
    url: `redis://127.0.0.1:${port}`,
    async restart() {
      await stopped(child, 'SIGTERM');
      await launch();
    },
    async stop() {
      await stopped(child, 'SIGTERM');
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export interface WorkerProcess {
  name: string;
  child: ChildProcess;
  /** kill -9: no chance to hand its jobs back. */
  kill(): Promise<void>;
  stop(): Promise<void>;
}

/** `npm run worker` (without npm, so the signals reach node itself) with one thread; a silent worker counts as dead after 2 s. */
export async function startWorker(redisUrl: string, name: string, env: Record<string, string> = {}): Promise<WorkerProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/worker/main.ts'], {
    cwd: root,
    env: { ...process.env, TSX_TSCONFIG_PATH: 'server/tsconfig.json', REDIS_URL: redisUrl, RUN_THREADS: '1', WORKER_NAME: name, WORKER_LOCK_SECONDS: '2', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  await started(child, /Overstrand worker/, `worker ${name}`);
  return { name, child, kill: () => stopped(child, 'SIGKILL'), stop: () => stopped(child, 'SIGTERM') };
}
