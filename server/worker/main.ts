// `npm run worker`: a queue worker for a server started with REDIS_URL, on this or any other
// machine. It takes computations from the BullMQ queue into its own worker-thread pool
// (RUN_THREADS at once) and reports progress and outcomes back through the queue; it never opens
// the database. A cancel published by the server aborts the computation here. SIGTERM or SIGINT
// puts its running jobs back in the queue for another worker; a worker killed outright is
// noticed by BullMQ's stalled-job check (after WORKER_LOCK_SECONDS) and its jobs move on too.
import { WaitingError, Worker, type Job } from 'bullmq';
import { workerSettingsFromEnv } from '../config';
import { defaultRunLimits } from '../runs/limits';
import { createRunPool } from '../runs/pool';
import { execute, processName, type AbortReason } from '../runs/queue/execute';
import { ATTEMPTS, CANCEL_CHANNEL, cancelledKey, connect, QUEUE, type JobData, type JobProgress, type JobResult } from '../runs/queue/jobs';

async function main() {
  const settings = workerSettingsFromEnv(process.env);
  const name = settings.name ?? processName();
  const pool = createRunPool({ ...defaultRunLimits(), threads: settings.threads, maxMemoryMb: settings.maxMemoryMb });
  const redis = connect(settings.redisUrl);

  async function compute(job: Job<JobData, JobResult>, token?: string, signal?: AbortSignal): Promise<JobResult> {
    // Checked once the job is tracked (BullMQ tracks before calling us): a later cancel aborts `signal`.
    if (await redis.exists(cancelledKey(job.id!))) return null;
    const limits = { ...job.data.limits, maxMemoryMb: settings.maxMemoryMb };
    const report = (p: JobProgress) => void job.updateProgress({ fraction: p.fraction, objects: p.objects }).catch(() => undefined);
    const outcome = await execute(pool, job.data.computation, limits, report, signal!);
    if (outcome === null && signal!.reason === ('shutdown' satisfies AbortReason)) {
      await job.moveToWait(token);
      throw new WaitingError();
    }
    return outcome;
  }

  const worker = new Worker<JobData, JobResult>(QUEUE, compute, {
    connection: redis,
    concurrency: settings.threads,
    name,
    lockDuration: settings.lockMs,
    stalledInterval: settings.lockMs,
    maxStalledCount: ATTEMPTS - 1,
  });
  worker.on('error', (err) => console.error('queue worker:', err.message));
  const cancels = connect(settings.redisUrl);
  cancels.on('message', (_channel: string, runId: string) => void worker.cancelJob(runId, 'cancel' satisfies AbortReason));
  await cancels.subscribe(CANCEL_CHANNEL);
  await worker.waitUntilReady();
  console.log(`Overstrand worker "${name}": ${settings.threads} thread${settings.threads === 1 ? '' : 's'}, queue on ${new URL(settings.redisUrl).host}`);

  const shutdown = async () => {
    worker.cancelAllJobs('shutdown' satisfies AbortReason);
    await worker.close();
    await pool.destroy();
    await Promise.allSettled([cancels.quit(), redis.quit()]);
    process.exit(0);
  };
  process.once('SIGINT', () => void shutdown());
  process.once('SIGTERM', () => void shutdown());
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
