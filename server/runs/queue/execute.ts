// One computation in a pool thread under the run limits, the same in the server's own pool and
// in a queue worker: the wall-time limit aborts it, running out of the thread's heap becomes the
// failure the run records, progress is passed on at most every progressEveryMs. A cancel or a
// shutdown records nothing (the row says cancelled already, or the run is queued again); any
// other error is thrown, for the back end to record or retry.
import { hostname } from 'node:os';
import type { KhResultJson, RunDiagram } from '@/shared/api/runs';
import type { Progress } from '@/shared/khovanov';
import { formatDuration } from '@/shared/text/duration';
import type { RunLimits } from '../limits';
import { isOutOfMemory, type RunPool } from '../pool';

/** Why a computation was aborted from outside: asked to, or its process is stopping. */
export type AbortReason = 'cancel' | 'shutdown';

export interface Computation {
  diagram: RunDiagram;
  ring: string;
  reduced: boolean;
  computeS: boolean;
}

/** The limits that travel with a computation (a queue worker obeys the server's). */
export type ComputeLimits = Pick<RunLimits, 'maxWallMs' | 'maxMemoryMb' | 'progressEveryMs'>;

export type ComputeOutcome = { status: 'done'; result: KhResultJson } | { status: 'failed'; error: string };

export async function execute(
  pool: RunPool,
  c: Computation,
  limits: ComputeLimits,
  onProgress: (p: Progress) => void,
  signal: AbortSignal,
): Promise<ComputeOutcome | null> {
  const ac = new AbortController();
  const timedOut = Symbol('timeout');
  const timer = setTimeout(() => ac.abort(timedOut), limits.maxWallMs);
  const passOn = () => ac.abort(signal.reason);
  if (signal.aborted) passOn();
  else signal.addEventListener('abort', passOn, { once: true });
  let lastWrite = 0;
  const throttled = (p: Progress) => {
    const now = Date.now();
    if (now - lastWrite < limits.progressEveryMs) return;
    lastWrite = now;
    onProgress(p);
  };
  try {
    const { result } = await pool.run({ diagram: c.diagram, ring: c.ring, reduced: c.reduced, computeS: c.computeS, onProgress: throttled, signal: ac.signal });
    return { status: 'done', result };
  } catch (err) {
    if (ac.signal.reason === timedOut) {
      return { status: 'failed', error: `Stopped after the time limit of ${formatDuration(limits.maxWallMs)} per run. Try a smaller diagram, or ask the server's admin for a longer limit.` };
    }
    if (ac.signal.aborted) return null;
    if (isOutOfMemory(err)) {
      return { status: 'failed', error: `Ran out of memory: the computation needed more than the limit of ${limits.maxMemoryMb} MB per run.` };
    }
    throw err;
  } finally {
    clearTimeout(timer);
    signal.removeEventListener('abort', passOn);
  }
}

/** The message a run that failed with an unexpected error records. */
export function failureMessage(err: unknown): string {
  const message = (err as { message?: unknown } | null)?.message;
  return typeof message === 'string' ? `The computation failed: ${message}` : 'The computation failed';
}

/** How a run names the process that computed it (Run.worker). */
export const processName = () => `${hostname()} pid ${process.pid}`;
