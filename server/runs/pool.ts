// The worker-thread pool heavy runs execute in (piscina), sized by config.runs.threads, each
// thread's heap capped by config.runs.maxMemoryMb.
import { join } from 'node:path';
import { MessageChannel } from 'node:worker_threads';
import { threadPool } from '../jobs/pool';
import type { RunDiagram } from '@/shared/api/runs';
import type { Progress } from '@/shared/khovanov';
import type { RunLimits } from './limits';
import type { KhTask, KhTaskResult } from './worker';

export interface KhJob {
  diagram: RunDiagram;
  ring: string;
  reduced: boolean;
  computeS: boolean;
  onProgress(p: Progress): void;
  signal: AbortSignal;
}

export interface RunPool {
  run(job: KhJob): Promise<KhTaskResult>;
  destroy(): Promise<void>;
}

/** piscina's words for a thread that died of its heap limit (ERR_WORKER_OUT_OF_MEMORY). */
export function isOutOfMemory(err: unknown): boolean {
  // Not `instanceof Error`: errors from a worker may come from another realm.
  const e = (err ?? {}) as { code?: unknown; message?: unknown };
  return e.code === 'ERR_WORKER_OUT_OF_MEMORY' || /out of memory/i.test(String(e.message ?? ''));
}

export function createRunPool(limits: RunLimits): RunPool {
  const pool = threadPool(join(__dirname, 'worker.cjs'), limits);
  return {
    async run({ diagram, ring, reduced, computeS, onProgress, signal }) {
      const { port1, port2 } = new MessageChannel();
      port1.on('message', onProgress);
      const task: KhTask = { diagram, ring, reduced, computeS, progress: port2 };
      try {
        return (await pool.run(task, { transferList: [port2], signal })) as KhTaskResult;
      } finally {
        port1.close();
      }
    },
    destroy: () => pool.destroy(),
  };
}
