// Feeds the worker pool from the run table: the oldest queued computations start as threads
// free up, progress is written to the row (throttled), a result or failure ends the run.
// The API never waits for a computation; it writes rows and pokes the scheduler.
import type { Progress } from '@/shared/khovanov';
import type { Run } from '../db/entities';
import type { Deps } from '../deps';
import { afterChange, finishRun, type Outcome } from './lifecycle';
import { createRunPool, isOutOfMemory, type RunPool } from './pool';
import { nextQueued, requeueInterrupted, updateIf } from './repository';

/** Why a computation was aborted: asked to, its time was up, or the server is stopping. */
type AbortReason = 'cancel' | 'timeout' | 'shutdown';

export class Scheduler {
  private readonly pool: RunPool;
  private readonly active = new Map<string, AbortController>();
  private readonly pending = new Set<Promise<unknown>>();
  private chain: Promise<void> = Promise.resolve();
  private stopped = false;

  constructor(private readonly deps: Deps) {
    this.pool = createRunPool(deps.config.runs);
  }

  /**
   * Queued runs and runs a previous process left running start again. Runs this process already
   * took (started before start(), e.g. by the demo seed) are not interrupted: the requeue waits
   * its turn in the chain, so no fill is between marking a run running and tracking it.
   */
  async start(): Promise<void> {
    const requeue = this.chain.then(() => requeueInterrupted(this.deps.db, [...this.active.keys()]));
    this.chain = requeue.then(() => undefined, () => undefined);
    const n = await requeue;
    if (n > 0) this.deps.log.info({ runs: n }, 'interrupted runs queued again');
    this.poke();
  }

  /** Something was queued: start what fits. Calls are serialised, so a run is taken once. */
  poke(): void {
    this.chain = this.chain
      .then(() => this.fill())
      .catch((err: unknown) => this.deps.log.error({ err }, 'run scheduler failed'));
  }

  /** Stops the computation of a running run (its row was already marked cancelled). */
  cancel(id: string): void {
    this.active.get(id)?.abort('cancel' satisfies AbortReason);
  }

  async stop(): Promise<void> {
    this.stopped = true;
    for (const ac of this.active.values()) ac.abort('shutdown' satisfies AbortReason);
    await this.chain;
    await this.pool.destroy();
    await Promise.allSettled([...this.pending]);
  }

  private async fill(): Promise<void> {
    const { db, config } = this.deps;
    while (!this.stopped && this.active.size < config.runs.threads) {
      const run = await nextQueued(db, [...this.active.keys()]);
      if (!run) return;
      if (await updateIf(db, run.id, ['queued'], { status: 'running', startedAt: this.deps.now().toISOString() })) {
        this.launch(run);
        await afterChange(this.deps, run.id);
      }
    }
  }

  private track<T>(p: Promise<T>): Promise<T> {
    this.pending.add(p);
    void p.finally(() => this.pending.delete(p)).catch(() => undefined);
    return p;
  }

  private launch(run: Run): void {
    const { runs: limits } = this.deps.config;
    const ac = new AbortController();
    this.active.set(run.id, ac);
    const timer = setTimeout(() => ac.abort('timeout' satisfies AbortReason), limits.maxWallMs);
    let lastWrite = 0;
    const onProgress = (p: Progress) => {
      const now = Date.now();
      if (this.stopped || now - lastWrite < limits.progressEveryMs) return;
      lastWrite = now;
      this.track(
        updateIf(this.deps.db, run.id, ['running'], { progress: p.fraction, complexSize: p.objects }).then((changed) =>
          changed && run.parentRunId ? afterChange(this.deps, run.id) : undefined,
        ),
      ).catch((err: unknown) => this.deps.log.error({ err, runId: run.id }, 'progress write failed'));
    };
    const work = this.pool
      .run({ diagram: run.diagram, ring: run.ring, reduced: run.reduced, onProgress, signal: ac.signal })
      .then(
        ({ result }): Outcome => ({ status: 'done', result }),
        (err: unknown): Outcome | null => this.failure(ac.signal.reason as AbortReason | undefined, err),
      )
      .then((outcome) => (outcome && !this.stopped ? finishRun(this.deps, run.id, outcome) : false))
      .catch((err: unknown) => this.deps.log.error({ err, runId: run.id }, 'run outcome not recorded'))
      .finally(() => {
        clearTimeout(timer);
        this.active.delete(run.id);
        if (!this.stopped) this.poke();
      });
    this.track(work);
  }

  /** The failure a run ends with, or null when there is nothing to record. */
  private failure(reason: AbortReason | undefined, err: unknown): Outcome | null {
    const { maxWallMs, maxMemoryMb } = this.deps.config.runs;
    if (reason === 'shutdown' || reason === 'cancel') return null; // shutdown: queued again at next start; cancel: already recorded
    if (reason === 'timeout') {
      return { status: 'failed', error: `Stopped after the time limit of ${formatDuration(maxWallMs)} per run. Try a smaller diagram, or ask the server's admin for a longer limit.` };
    }
    if (isOutOfMemory(err)) {
      return { status: 'failed', error: `Ran out of memory: the computation needed more than the limit of ${maxMemoryMb} MB per run.` };
    }
    this.deps.log.error({ err }, 'run failed');
    const message = (err as { message?: unknown } | null)?.message;
    return { status: 'failed', error: typeof message === 'string' ? `The computation failed: ${message}` : 'The computation failed' };
  }
}

export function formatDuration(ms: number): string {
  if (ms < 1000) return `${ms} ms`;
  if (ms < 120_000) return `${Math.round(ms / 1000)} s`;
  return `${Math.round(ms / 60_000)} min`;
}

const schedulers = new WeakMap<Deps, Scheduler>();

/** One scheduler per running server (its Deps). */
export function schedulerOf(deps: Deps): Scheduler {
  let s = schedulers.get(deps);
  if (!s) schedulers.set(deps, (s = new Scheduler(deps)));
  return s;
}
