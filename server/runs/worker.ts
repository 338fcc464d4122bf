// One Khovanov computation inside a pool thread (loaded through worker.mjs), with the
// s-invariant over Q and F2 after it when asked. Progress goes back over the task's MessagePort;
// cancellation and the wall-time limit terminate the thread (piscina aborts the task), so the
// engine needs no cooperation for them.
import { threadId, type MessagePort } from 'node:worker_threads';
import type { KhResultJson, RunDiagram } from '@/shared/api/runs';
import { khovanov, type Progress } from '@/shared/khovanov';
import { rasmussenS } from '@/shared/rasmussen';

export interface KhTask {
  diagram: RunDiagram;
  ring: string;
  reduced: boolean;
  computeS: boolean;
  progress: MessagePort;
}

export interface KhTaskResult {
  result: KhResultJson;
  /** The pool thread that computed it (never 0, the main thread). */
  threadId: number;
}

export default function compute(task: KhTask): KhTaskResult {
  const { pd } = task.diagram;
  const unknots = pd.length === 0 ? Math.max(task.diagram.unknots, 1) : task.diagram.unknots;
  // With s the run is three engine passes (Kh, s over Q, s over F2), each a third of the bar.
  const parts = task.computeS ? 3 : 1;
  const part = (k: number) => (p: Progress) => task.progress.postMessage({ ...p, fraction: (k + p.fraction) / parts });
  try {
    const result = khovanov(pd, { ring: task.ring as 'Z', reduced: task.reduced, unknots, onProgress: part(0) });
    if (!task.computeS) return { result, threadId };
    const s = { Q: rasmussenS(pd, 'Q', { unknots, onProgress: part(1) }), F2: rasmussenS(pd, 'F2', { unknots, onProgress: part(2) }) };
    return { result: { ...result, s }, threadId };
  } finally {
    task.progress.close();
  }
}
