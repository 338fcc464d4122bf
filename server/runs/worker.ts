// One Khovanov computation inside a pool thread (loaded through worker.mjs). Progress goes back
// over the task's MessagePort; cancellation and the wall-time limit terminate the thread
// (piscina aborts the task), so the engine needs no cooperation for them.
import { threadId, type MessagePort } from 'node:worker_threads';
import type { KhResultJson, RunDiagram } from '@/shared/api/runs';
import { khovanov, type Progress } from '@/shared/khovanov';

export interface KhTask {
  diagram: RunDiagram;
  ring: string;
  reduced: boolean;
  progress: MessagePort;
}

export interface KhTaskResult {
  result: KhResultJson;
  /** The pool thread that computed it (never 0, the main thread). */
  threadId: number;
}

export default function compute(task: KhTask): KhTaskResult {
  const { pd, unknots } = task.diagram;
  try {
    const result = khovanov(pd, {
      ring: task.ring as 'Z',
      reduced: task.reduced,
      unknots: pd.length === 0 ? Math.max(unknots, 1) : unknots,
      onProgress: (p: Progress) => task.progress.postMessage(p),
    });
    return { result, threadId };
  } finally {
    task.progress.close();
  }
}
