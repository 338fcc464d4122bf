// A 16-cell cable sweep through the BullMQ queue with one worker process, then with two (one
// thread each), on a real redis-server: wall time from the request to the sweep's end, and the
// ratio. Two workers reach at most 2x, and less on a machine with two cores that also run
// Redis, the server and whatever else is busy, so the ratio measures the queue's overhead and
// the machine's spare cores, not a speed goal.
import { loadavg } from 'node:os';
import { RunDetail } from '@/shared/api/runs';
import { AuthResponse } from '@/shared/api/auth';
import { fromBraid } from '@/shared/knot/braid';
import { startServer } from '@/server/server';
import { startRedis, startWorker } from '../server/queue-processes';
import { round, type Line } from './timing';

// T(4,16) as the closure of (sigma_1 sigma_2 sigma_3)^16 (common practice): 48 crossings and 4
// components, so r+ + r- <= 1 gives 2^4 = 16 cells (each component kept or reversed).
const torus4 = (q: number) => fromBraid(Array.from({ length: q }, () => [1, 2, 3]).flat()).pd;
const body = { kind: 'cable-sweep', diagram: { pd: torus4(16) }, ring: 'Q', sweep: { maxStrands: 1 } };

async function sweepSeconds(workers: number): Promise<{ seconds: number; bySecond: number }> {
  const redis = await startRedis();
  const procs = await Promise.all(Array.from({ length: workers }, (_, k) => startWorker(redis.url, `bench-${k + 1}`)));
  const server = await startServer({ config: { bcryptRounds: 4, redisUrl: redis.url } });
  try {
    const post = (path: string, payload: unknown, token?: string) =>
      fetch(`${server.url}${path}`, { method: 'POST', headers: { 'Content-Type': 'application/json', ...(token && { Authorization: `Bearer ${token}` }) }, body: JSON.stringify(payload) });
    const { token } = AuthResponse.parse(await (await post('/api/auth/register', { email: 'bench@example.org', password: 'correct horse', displayName: 'Bench' })).json());
    const until = async (id: string) => {
      for (;;) {
        const run = RunDetail.parse(await (await fetch(`${server.url}/api/runs/${id}`, { headers: { Authorization: `Bearer ${token}` } })).json());
        if (['done', 'failed', 'cancelled'].includes(run.status)) return run;
        await new Promise((r) => setTimeout(r, 50));
      }
    };
    const run = async (payload: unknown) => until(((await (await post('/api/runs', payload, token)).json()) as { id: string }).id);
    // Each worker's first job also loads its pool thread: one run per worker first, long enough
    // (about half a second) that each worker takes one.
    await Promise.all(Array.from({ length: workers }, () => run({ diagram: { pd: torus4(8) }, ring: 'Q' })));
    const t0 = performance.now();
    const sweep = await run(body);
    if (sweep.status !== 'done' || sweep.children.length !== 16) throw new Error(`the sweep ended ${sweep.status} with ${sweep.children.length} cells`);
    return { seconds: (performance.now() - t0) / 1000, bySecond: sweep.children.filter((c) => c.worker === 'bench-2').length };
  } finally {
    await server.stop();
    for (const p of procs) await p.stop();
    await redis.stop();
  }
}

export async function queueBench(): Promise<Line[]> {
  const one = (await sweepSeconds(1)).seconds;
  const { seconds: two, bySecond } = await sweepSeconds(2);
  return [
    { name: '16-cell sweep of T(4,16) over Q, 1 worker process', value: round(one), unit: 's' },
    { name: '16-cell sweep of T(4,16) over Q, 2 worker processes', value: round(two), unit: 's' },
    { name: 'cells the second of 2 workers computed', value: bySecond, unit: 'of 16' },
    { name: 'speed-up of 2 workers over 1 (at most 2; this machine has 2 cores for workers, Redis and the server)', value: round(one / two), unit: 'x' },
    // Other work on the machine takes the cores the second worker would use.
    { name: 'load average (1 min) at the end', value: round(loadavg()[0]), unit: 'processes' },
  ];
}
