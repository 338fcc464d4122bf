// The embedded back end (the default): feeds the server's own worker-thread pool from the run
// table. The next queued computation starts as a thread frees up, progress is written to the
// row, a result or failure ends the run.
import type { Progress } from '@/shared/khovanov';
import type { Run } from '../../db/entities';
import type { Deps } from '../../deps';
import { afterChange, finishRun, recordProgress } from '../lifecycle';
import { createRunPool, type RunPool } from '../pool';
import { nextQueued, requeueInterrupted, updateIf } from '../repository';
import type { Scheduler } from '../scheduler';
import { execute, failureMessage, processName, type AbortReason, type ComputeOutcome } from './execute';

export class EmbeddedScheduler implements Scheduler {
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
    this.submit();
  }

  /** Something was queued: start what fits. Calls are serialised, so a run is taken once. */
  submit(): void {
    this.chain = this.chain
      .then(() => this.fill())
      .catch((err: unknown) => this.deps.log.error({ err }, 'run scheduler failed'));
  }

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
      if (await updateIf(db, run.id, ['queued'], { status: 'running', startedAt: this.deps.now().toISOString(), worker: `${processName()}, the server's own pool` })) {
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
    const ac = new AbortController();
    this.active.set(run.id, ac);
    const onProgress = (p: Progress) => {
      if (this.stopped) return;
      this.track(recordProgress(this.deps, run.id, p)).catch((err: unknown) => this.deps.log.error({ err, runId: run.id }, 'progress write failed'));
    };
    const work = execute(this.pool, run, this.deps.config.runs, onProgress, ac.signal)
      .catch((err: unknown): ComputeOutcome => {
        this.deps.log.error({ err, runId: run.id }, 'run failed');
        return { status: 'failed', error: failureMessage(err) };
      })
      .then((outcome) => (outcome && !this.stopped ? finishRun(this.deps, run.id, outcome) : false))
      .catch((err: unknown) => this.deps.log.error({ err, runId: run.id }, 'run outcome not recorded'))
      .finally(() => {
        this.active.delete(run.id);
        if (!this.stopped) this.submit();
      });
    this.track(work);
  }
}
