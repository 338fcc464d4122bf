// The job pool: worker threads (piscina) for the short computations that requests and writes
// need (a sketch's feed summary, a sweep's cables and their keys, a run's reuse key), so none
// of them runs on the request thread. Apart from the runs' pool (server/runs/pool.ts), so a
// short job never waits behind hours of homology. Each job has a wall-time limit.
import { join } from 'node:path';
import Piscina from 'piscina';
import { AppError } from '../http/errors';
import type * as tasks from './tasks';

type Tasks = typeof tasks;
export type JobName = keyof Tasks;

export interface JobLimits {
  /** Threads computing at once; two, so a request's job runs beside a feed summary (summaries.ts takes one at a time). */
  threads: number;
  /** Wall time of one job, from when it was submitted (queueing included). */
  maxWallMs: number;
  /** V8 old-generation heap of each thread. */
  maxMemoryMb: number;
}

export const defaultJobLimits = (): JobLimits => ({ threads: 2, maxWallMs: 120_000, maxMemoryMb: 1024 });

export interface JobPool {
  run<N extends JobName>(name: N, input: Parameters<Tasks[N]>[0]): Promise<ReturnType<Tasks[N]>>;
  destroy(): Promise<void>;
}

/** Threads started on demand and ended after 30 s idle, each heap capped: the job pool's and the runs'. */
export function threadPool(filename: string, limits: { threads: number; maxMemoryMb: number }): Piscina {
  return new Piscina({
    filename,
    minThreads: 0,
    maxThreads: limits.threads,
    idleTimeout: 30_000,
    resourceLimits: { maxOldGenerationSizeMb: limits.maxMemoryMb },
  });
}

export function createJobPool(limits: JobLimits): JobPool {
  const pool = threadPool(join(__dirname, 'worker.cjs'), limits);
  return {
    async run(name, input) {
      const signal = AbortSignal.timeout(limits.maxWallMs);
      try {
        return await pool.run(input, { name, signal });
      } catch (err) {
        // Aborting a running task ends its thread (piscina starts a fresh one for the next).
        if (signal.aborted) throw new AppError('busy', 503, `The server stopped a computation after ${Math.round(limits.maxWallMs / 1000)} s; try a smaller diagram.`);
        throw err;
      }
    },
    destroy: () => pool.destroy(),
  };
}
