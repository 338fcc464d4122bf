// Runs through the BullMQ back end against a real redis-server (started here on a free port)
// and real `npm run worker` processes: the same results as the embedded pool, on two workers;
// cancel across processes; kill -9 of a worker mid-run; Redis and server restarts; fair share.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Queue } from 'bullmq';
import { defaultRunLimits, type RunLimits } from '@/server/runs/limits';
import { createRunPool } from '@/server/runs/pool';
import { connect, QUEUE } from '@/server/runs/queue/jobs';
import type { RunningServer } from '@/server/server';
import type { RunDetail } from '@/shared/api/runs';
import request from 'supertest';
import { bearer, signUp, testServer } from './helpers';
import { startRedis, startWorker, type RedisProcess, type WorkerProcess } from './queue-processes';
import { TREFOIL_Z, ended, mailFor, read, slow, start, torus, trefoil, waitFor } from './runs-fixtures';

jest.setTimeout(180_000);

/** About 4 s alone on this machine over Q: long enough to act on while it computes. */
const medium = () => torus(6, 7);

const limits = (l: Partial<RunLimits> = {}): RunLimits => ({ ...defaultRunLimits(), threads: 1, progressEveryMs: 20, ...l });

let redis: RedisProcess;
const workers: WorkerProcess[] = [];
const servers: RunningServer[] = [];

beforeEach(async () => {
  redis = await startRedis();
});
afterEach(async () => {
  for (const s of servers.splice(0)) await s.stop();
  for (const w of workers.splice(0)) await w.stop();
  await redis.stop();
});

/** A server on port 0 whose runs go to the queue (or, with `embedded`, to its own pool). */
async function queueServer(options: { dbPath?: string; embedded?: boolean } = {}): Promise<RunningServer> {
  const server = await testServer({ dbPath: options.dbPath, config: { redisUrl: options.embedded ? null : redis.url, runs: limits() } });
  servers.push(server);
  return server;
}

async function worker(name: string): Promise<WorkerProcess> {
  const w = await startWorker(redis.url, name);
  workers.push(w);
  return w;
}

/** The job of a run as the queue holds it. */
async function jobState(runId: string): Promise<string> {
  const connection = connect(redis.url);
  const queue = new Queue(QUEUE, { connection });
  try {
    return await queue.getJobState(runId);
  } finally {
    await queue.close();
    await connection.quit();
  }
}

async function waitForJob(runId: string, state: string, timeoutMs: number): Promise<void> {
  const t0 = Date.now();
  while ((await jobState(runId)) !== state) {
    if (Date.now() - t0 > timeoutMs) throw new Error(`job ${runId} is ${await jobState(runId)}, not ${state}, after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** Computing on a worker, with progress to show for it. */
const computing = (r: RunDetail) => r.status === 'running' && r.worker !== null && r.progress.fraction > 0;

/** The result the server's own pool computes for the same input: what the queue must give back. */
async function embeddedResult(pd: ReturnType<typeof torus>, ring: string) {
  const pool = createRunPool(limits());
  try {
    const out = await pool.run({ diagram: { pd, unknots: 0 }, ring, reduced: false, computeS: false, onProgress: () => undefined, signal: new AbortController().signal });
    return out.result;
  } finally {
    await pool.destroy();
  }
}


describe('through the queue', () => {
  it('does not start a server whose Redis does not answer, and says what to do', async () => {
    const nobody = 'redis://127.0.0.1:9'; // the discard port: nothing answers there
    await expect(testServer({ config: { redisUrl: nobody } })).rejects.toThrow(
      'Redis at 127.0.0.1:9 (REDIS_URL) does not answer within 5 s: start it, or unset REDIS_URL to compute runs in the server itself',
    );
  });

  it('computes on worker processes what the embedded pool computes, and names the worker', async () => {
    await worker('w1');
    const server = await queueServer();
    const { token, user } = await signUp(server, 'Queue Quinn');
    const res = await start(server, token, { diagram: { pd: trefoil() }, ring: 'Z' });
    expect(res.status).toBe(201);
    const run = await waitFor(server, token, res.body.id, ended);
    expect(run).toMatchObject({ status: 'done', worker: 'w1', error: null });
    expect(run.result!.groups).toEqual(TREFOIL_Z);
    expect(run.result!.euler!.ok).toBe(true);
    const mail = await mailFor(server, (m) => m.to.includes(user.email));
    expect(mail.subject).toBe('Run succeeded: "PD code, 3 crossings", Khovanov homology over Z');
  });

  it("obeys the server's time limit on the worker", async () => {
    await worker('w1');
    const server = await testServer({ config: { redisUrl: redis.url, runs: limits({ maxWallMs: 1500 }) } });
    servers.push(server);
    const { token } = await signUp(server);
    const run = await waitFor(server, token, (await start(server, token, { diagram: { pd: slow() }, ring: 'Q' })).body.id, ended);
    expect(run).toMatchObject({ status: 'failed', worker: 'w1' });
    expect(run.error).toMatch(/^Stopped after the time limit of 1.5 s per run/);
  });

  it('spreads a sweep over two worker processes, cell for cell the same as the embedded pool', async () => {
    await Promise.all([worker('w1'), worker('w2')]);
    const [queued, embedded] = await Promise.all([queueServer(), queueServer({ embedded: true })]);
    const body = { kind: 'cable-sweep' as const, diagram: { pd: torus(2, 5) }, ring: 'Q', sweep: { maxStrands: 2 } };
    const outcomes = await Promise.all(
      [queued, embedded].map(async (server) => {
        const { token } = await signUp(server, 'Sweeping Sam');
        const res = await start(server, token, body);
        expect(res.status).toBe(201);
        return waitFor(server, token, res.body.id, ended, 120_000);
      }),
    );
    const [viaQueue, viaPool] = outcomes;
    expect(viaQueue.status).toBe('done');
    expect(viaQueue.children).toHaveLength(5); // (1,0) (0,1) (2,0) (1,1) (0,2)
    expect(viaQueue.children.map((c) => [c.cable, c.result])).toEqual(viaPool.children.map((c) => [c.cable, c.result]));
    expect(viaQueue.children.every((c) => c.status === 'done' && c.result!.euler!.ok)).toBe(true);
    expect(new Set(viaQueue.children.map((c) => c.worker))).toEqual(new Set(['w1', 'w2']));
    expect(viaPool.children.every((c) => c.worker!.endsWith("the server's own pool"))).toBe(true);
  });
});

describe('cancel', () => {
  it('removes a waiting job, and stops a running one on its worker, which is free again at once', async () => {
    await worker('w1');
    const server = await queueServer();
    const { token } = await signUp(server, 'Cancelling Cleo');
    const long = (await start(server, token, { diagram: { pd: slow() }, ring: 'Q' })).body.id;
    await waitFor(server, token, long, computing);
    const waiting = (await start(server, token, { diagram: { pd: slow() }, ring: 'Q', label: 'second' })).body.id;
    expect(await jobState(waiting)).toBe('prioritized');

    const cancel = (id: string) => request(server.url).post(`/api/runs/${id}/cancel`).set(bearer(token));
    expect((await cancel(waiting)).body.status).toBe('cancelled');
    await waitForJob(waiting, 'unknown', 5_000);

    expect((await cancel(long)).body.status).toBe('cancelled');
    // The worker's computation is aborted (its job ends with nothing to record), well before the
    // ~35 s it needs; then the same one-thread worker takes the next run.
    await waitForJob(long, 'completed', 10_000);
    const next = (await start(server, token, { diagram: { pd: trefoil() }, ring: 'Z' })).body.id;
    const run = await waitFor(server, token, next, ended, 20_000);
    expect(run).toMatchObject({ status: 'done', worker: 'w1' });
    expect((await read(server, token, long)).status).toBe('cancelled');
  });
});

describe('a worker killed mid-run', () => {
  it('kill -9: the job goes to the other worker and the run finishes with the right result', async () => {
    const pair = await Promise.all([worker('w1'), worker('w2')]);
    const server = await queueServer();
    const { token } = await signUp(server, 'Killing Kit');
    const id = (await start(server, token, { diagram: { pd: medium() }, ring: 'Q' })).body.id;
    const first = await waitFor(server, token, id, computing);
    const [victim, survivor] = first.worker === 'w1' ? pair : [pair[1], pair[0]];
    await victim.kill();
    const run = await waitFor(server, token, id, ended, 120_000);
    expect(run).toMatchObject({ status: 'done', worker: survivor.name, error: null });
    expect(run.result).toEqual(await embeddedResult(medium(), 'Q'));
    expect(run.result!.euler!.ok).toBe(true);
  });

  it('fails the run with the reason when its workers die three times', async () => {
    const server = await queueServer();
    const { token } = await signUp(server, 'Unlucky Uma');
    const id = (await start(server, token, { diagram: { pd: slow() }, ring: 'Q' })).body.id;
    for (const name of ['w1', 'w2', 'w3']) {
      const w = await worker(name);
      await waitFor(server, token, id, (r) => computing(r) && r.worker === name);
      await w.kill();
    }
    await worker('w4'); // its stalled-job check finds the job's third stall
    const run = await waitFor(server, token, id, ended, 60_000);
    expect(run.status).toBe('failed');
    expect(run.error).toMatch(/stopped 3 times without an answer/);
  });
});

describe('restarts', () => {
  it('Redis restarted: the queued work is still there (append-only file) and is computed', async () => {
    const server = await queueServer();
    const { token } = await signUp(server, 'Patient Pat');
    const id = (await start(server, token, { diagram: { pd: trefoil() }, ring: 'Z' })).body.id;
    await waitForJob(id, 'prioritized', 5_000);
    await redis.restart();
    await worker('w1');
    const run = await waitFor(server, token, id, ended, 60_000);
    expect(run).toMatchObject({ status: 'done', worker: 'w1' });
    expect(run.result!.groups).toEqual(TREFOIL_Z);
  });

  it('the server restarted: the outcome that came while it was down is recorded from the queue', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'overstrand-queue-'));
    try {
      const dbPath = join(dir, 'db.sqlite');
      await worker('w1');
      const before = await queueServer({ dbPath });
      const { token } = await signUp(before, 'Restarting Ray');
      const id = (await start(before, token, { diagram: { pd: medium() }, ring: 'Q' })).body.id;
      await waitFor(before, token, id, computing);
      await before.stop();
      servers.splice(servers.indexOf(before), 1);
      await waitForJob(id, 'completed', 120_000);

      const after = await queueServer({ dbPath });
      const run = await read(after, token, id);
      expect(run).toMatchObject({ status: 'done', worker: 'w1' });
      expect(run.result).toEqual(await embeddedResult(medium(), 'Q'));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it("the server restarted after Redis lost its data: runs whose job is gone are queued again", async () => {
    const dir = mkdtempSync(join(tmpdir(), 'overstrand-queue-'));
    try {
      const dbPath = join(dir, 'db.sqlite');
      const before = await queueServer({ dbPath });
      const { token } = await signUp(before, 'Forgotten Flo');
      const id = (await start(before, token, { diagram: { pd: trefoil() }, ring: 'Z' })).body.id;
      await waitForJob(id, 'prioritized', 5_000);
      await before.stop();
      servers.splice(servers.indexOf(before), 1);
      const connection = connect(redis.url);
      await connection.flushall();
      await connection.quit();
      expect(await jobState(id)).toBe('unknown');

      const after = await queueServer({ dbPath });
      await worker('w1');
      expect(await waitFor(after, token, id, ended)).toMatchObject({ status: 'done', worker: 'w1' });
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

/**
 * Fair share, the same rule in both back ends: one person queues four runs of some seconds
 * each, then another starts a 3-crossing run; it is computed next, not after the four.
 */
async function fairShare(server: RunningServer) {
  const a = await signUp(server, 'Busy Bo');
  const b = await signUp(server, 'Brief Bea');
  const many = [];
  for (let k = 0; k < 4; k++) many.push((await start(server, a.token, { diagram: { pd: medium() }, ring: 'Q', label: `many ${k}` })).body.id);
  await waitFor(server, a.token, many[0], computing);
  const small = (await start(server, b.token, { diagram: { pd: trefoil() }, ring: 'Z' })).body.id;
  expect((await waitFor(server, b.token, small, ended, 120_000)).status).toBe('done');
  const left = await Promise.all(many.map((id) => read(server, a.token, id)));
  expect(left.filter((r) => !ended(r)).length).toBeGreaterThanOrEqual(2);
  for (const id of many) await waitFor(server, a.token, id, ended, 120_000);
}

describe('fair share', () => {
  it('through the queue: a second person\'s small run does not wait for the first one\'s queue to drain', async () => {
    await worker('w1');
    await fairShare(await queueServer());
  });

  it('in the embedded pool, by the same rule', async () => {
    await fairShare(await queueServer({ embedded: true }));
  });
});
