// The scheduler: what the runs area hands its computations to. The API never waits for a
// computation; it writes rows and submits the queued ones. One back end per server: the
// embedded worker-thread pool (server/runs/queue/embedded.ts, the default), or with REDIS_URL a
// BullMQ queue that `npm run worker` processes on any machine consume (queue/bullmq.ts).
import type { Run } from '../db/entities';
import type { Deps } from '../deps';
import { BullmqScheduler } from './queue/bullmq';
import { EmbeddedScheduler } from './queue/embedded';

export interface Scheduler {
  /** Takes up the work the run table says is queued or was running when the server stopped. */
  start(): Promise<void>;
  /** These rows were just written as queued computations. */
  submit(runs: readonly Run[]): void;
  /** Stops the computation of a run, wherever it runs (its row was already marked cancelled). */
  cancel(id: string): void;
  stop(): Promise<void>;
}

const schedulers = new WeakMap<Deps, Scheduler>();

/** One scheduler per running server (its Deps). */
export function schedulerOf(deps: Deps): Scheduler {
  let s = schedulers.get(deps);
  if (!s) schedulers.set(deps, (s = deps.config.redisUrl ? new BullmqScheduler(deps) : new EmbeddedScheduler(deps)));
  return s;
}
