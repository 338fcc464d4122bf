// The freeze probe: GET /api/health on a fixed schedule while something else is served, each
// probe timed from the moment it was due, not from when it could be sent. A server that blocks
// its event loop (this process's, for an in-process test server) delays every probe due
// meanwhile, so a 7 s block shows as hundreds of slow probes, not one (the correction for
// "coordinated omission", common practice in load testing).
import { performance } from 'node:perf_hooks';

export interface Probe {
  samples: number;
  p50: number;
  p99: number;
  max: number;
}

/** Nearest-rank percentile of sorted values (common practice). */
const percentile = (sorted: number[], p: number) => sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)];

/** Probes `url`/api/health every `everyMs` while `work` runs and for at least `minMs`; latencies in ms. */
export async function probeHealth<T>(url: string, work: () => Promise<T>, { everyMs = 50, minMs = 5_000 } = {}): Promise<{ value: T; probe: Probe }> {
  // Node loads its fetch client on first use, synchronously: not a cost of the server's.
  await (await fetch(`${url}/api/health`)).text();
  const latencies: number[] = [];
  const inFlight: Promise<void>[] = [];
  const t0 = performance.now();
  let due = 0;
  let timer: NodeJS.Timeout | undefined;
  const sendDue = () => {
    for (let at = t0 + due * everyMs; at <= performance.now(); at = t0 + ++due * everyMs) {
      const dueAt = at;
      // A probe that fails (a connect timing out behind a long block) counts with its time too.
      const done = () => void latencies.push(performance.now() - dueAt);
      inFlight.push(fetch(`${url}/api/health`).then((res) => res.text()).then(done, done));
    }
  };
  const tick = () => {
    sendDue();
    timer = setTimeout(tick, everyMs);
  };
  tick();
  try {
    const [value] = await Promise.all([work(), new Promise((resolve) => setTimeout(resolve, minMs))]);
    clearTimeout(timer);
    sendDue(); // the probes that fell due while `work` ended
    await Promise.all(inFlight);
    const sorted = latencies.sort((a, b) => a - b);
    const r = Math.round;
    return { value, probe: { samples: sorted.length, p50: r(percentile(sorted, 50)), p99: r(percentile(sorted, 99)), max: r(sorted[sorted.length - 1]) } };
  } finally {
    clearTimeout(timer);
  }
}
