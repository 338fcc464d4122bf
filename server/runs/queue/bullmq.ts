// The BullMQ back end (REDIS_URL set): every computation is a job on Redis, taken by any
// `npm run worker` process on any machine. Workers never touch the database: they report
// progress and their outcome through the queue, and this server, the one writer of its SQLite
// file, records them from the queue's events. At start the run table is reconciled with the
// queue, so outcomes that arrived while the server was down are recorded and rows whose job was
// lost are queued again.
import { Queue, QueueEvents, type Job } from 'bullmq';
import type { Run } from '../../db/entities';
import type { Deps } from '../../deps';
import { afterChange, finishRun, recordProgress } from '../lifecycle';
import { backInQueue, findRun, liveComputations, updateIf } from '../repository';
import type { Scheduler } from '../scheduler';
import { ATTEMPTS, CANCEL_CHANNEL, cancelledKey, connect, QUEUE, type JobData, type JobProgress, type JobResult } from './jobs';

type RunJob = Job<JobData, JobResult>;

/** BullMQ's largest priority; turns beyond it share it (and go oldest first). */
const MAX_PRIORITY = 2_097_152;
/** How long the server waits for Redis at start. */
const CONNECT_MS = 5_000;
/** Finished jobs stay in Redis this long, for a server that was down to pick up their outcome. */
const KEEP_SECONDS = 7 * 24 * 3600;

export class BullmqScheduler implements Scheduler {
  private readonly redis;
  /** QueueEvents blocks on its connection, so it has its own. */
  private readonly eventsRedis;
  private readonly events;
  private readonly queue;
  private readonly pending = new Set<Promise<unknown>>();
  /** Events are recorded one after another, in the order the queue gave them. */
  private chain: Promise<void> = Promise.resolve();

  constructor(private readonly deps: Deps) {
    const url = deps.config.redisUrl!;
    this.redis = connect(url);
    this.eventsRedis = connect(url);
    this.events = new QueueEvents(QUEUE, { connection: this.eventsRedis, autorun: false });
    this.queue = new Queue<JobData, JobResult>(QUEUE, { connection: this.redis });
  }

  async start(): Promise<void> {
    const record = (what: string, jobId: string, f: () => Promise<unknown>) => {
      this.chain = this.chain.then(f).then(
        () => undefined,
        (err: unknown) => this.deps.log.error({ err, runId: jobId }, `recording a job's ${what} failed`),
      );
      this.track(this.chain);
    };
    this.events.on('active', ({ jobId }) => record('start', jobId, () => this.started(jobId)));
    this.events.on('progress', ({ jobId, data }) => record('progress', jobId, () => recordProgress(this.deps, jobId, data as JobProgress)));
    this.events.on('completed', ({ jobId }) => record('outcome', jobId, () => this.ended(jobId)));
    this.events.on('failed', ({ jobId }) => record('failure', jobId, () => this.ended(jobId)));
    this.events.on('stalled', ({ jobId }) => record('stall', jobId, () => this.requeued(jobId)));
    this.events.on('error', (err) => this.deps.log.error({ err }, 'run queue events'));
    this.queue.on('error', (err) => this.deps.log.error({ err }, 'run queue'));
    this.events.run().catch((err: unknown) => this.deps.log.error({ err }, 'run queue events stopped'));
    try {
      await reachable(Promise.all([this.queue.waitUntilReady(), this.events.waitUntilReady(), this.redis.ping()]), this.deps.config.redisUrl!);
    } catch (err) {
      this.redis.disconnect();
      this.eventsRedis.disconnect();
      throw err;
    }
    await this.reconcile();
  }

  submit(runs: readonly Run[]): void {
    for (const run of runs) {
      this.track(this.enqueue(run)).catch((err: unknown) => this.deps.log.error({ err, runId: run.id }, 'could not queue the run (it is queued again at the next start)'));
    }
  }

  /** Stops the job wherever it is: removed while it waits, aborted by its worker while it runs. */
  cancel(id: string): void {
    const work = async () => {
      await this.redis.set(cancelledKey(id), '1', 'EX', KEEP_SECONDS);
      await this.queue.remove(id).catch(() => 0); // a job a worker holds is locked; the message stops it
      await this.redis.publish(CANCEL_CHANNEL, id);
    };
    this.track(work()).catch((err: unknown) => this.deps.log.error({ err, runId: id }, 'cancel did not reach the queue'));
  }

  async stop(): Promise<void> {
    await Promise.allSettled([...this.pending]);
    await this.events.close();
    await this.queue.close();
    await Promise.allSettled([this.redis.quit(), this.eventsRedis.quit()]);
  }

  private track<T>(p: Promise<T>): Promise<T> {
    this.pending.add(p);
    void p.finally(() => this.pending.delete(p)).catch(() => undefined);
    return p;
  }

  private async enqueue(run: Run): Promise<void> {
    const data: JobData = {
      computation: { diagram: run.diagram, ring: run.ring, reduced: run.reduced, computeS: run.computeS },
      limits: { maxWallMs: this.deps.config.runs.maxWallMs, progressEveryMs: this.deps.config.runs.progressEveryMs },
    };
    await this.queue.add('khovanov', data, {
      jobId: run.id,
      priority: Math.min(Math.max(run.turn, 1), MAX_PRIORITY),
      attempts: ATTEMPTS,
      removeOnComplete: { age: KEEP_SECONDS },
      removeOnFail: { age: KEEP_SECONDS },
    });
  }

  /** A worker took the job: the row says running, and who runs it. */
  private async started(id: string): Promise<void> {
    const job = await this.queue.getJob(id);
    if (await updateIf(this.deps.db, id, ['queued'], { status: 'running', startedAt: this.deps.now().toISOString(), worker: job?.processedBy ?? null })) await afterChange(this.deps, id);
  }

  /** Its worker stopped answering and the job went back to the queue (BullMQ's stalled-job check). */
  private async requeued(id: string): Promise<void> {
    if (await updateIf(this.deps.db, id, ['running'], backInQueue)) await afterChange(this.deps, id);
  }

  /** Completed or failed for good (a failed try with tries left is not an end). */
  private async ended(id: string): Promise<void> {
    const job = await this.queue.getJob(id);
    if (!job) return;
    const state = await job.getState();
    if (state === 'completed' && job.returnvalue) await finishRun(this.deps, id, job.returnvalue);
    if (state === 'failed') await finishRun(this.deps, id, { status: 'failed', error: failedReason(job) });
  }

  private async reconcile(): Promise<void> {
    let requeued = 0;
    for (const run of await liveComputations(this.deps.db)) {
      const job = await this.queue.getJob(run.id);
      if (job) {
        await this.ended(run.id);
        continue;
      }
      // No job: lost with Redis's data, or never queued (the server stopped first).
      await updateIf(this.deps.db, run.id, ['running'], backInQueue);
      const fresh = await findRun(this.deps.db, run.id);
      if (fresh?.status === 'queued') {
        await this.enqueue(fresh);
        requeued++;
      }
    }
    if (requeued > 0) this.deps.log.info({ runs: requeued }, 'runs missing from the queue queued again');
  }
}

/** A server whose queue does not answer does not start (it would accept runs nobody computes). */
async function reachable(ready: Promise<unknown>, url: string): Promise<void> {
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`Redis at ${new URL(url).host} (REDIS_URL) does not answer within ${CONNECT_MS / 1000} s: start it, or unset REDIS_URL to compute runs in the server itself`)), CONNECT_MS);
  });
  try {
    await Promise.race([ready, late]);
  } finally {
    clearTimeout(timer);
  }
}

function failedReason(job: RunJob): string {
  if (/stalled/i.test(job.failedReason ?? '')) {
    return `The workers computing it stopped ${ATTEMPTS} times without an answer (killed, or the machine went down), so it is not tried again.`;
  }
  return `The computation failed ${job.attemptsMade} time${job.attemptsMade === 1 ? '' : 's'} on its workers: ${job.failedReason}`;
}
