// One Khovanov computation inside a pool thread (loaded through worker.cjs), with the
// s-invariant over Q and F2 after it when asked, or a bands run: the band presentation's
// certificate with the unlink check by Kh over Z and no crossing limit (the run has its own). Progress goes back over the task's MessagePort;
// cancellation and the wall-time limit terminate the thread (piscina aborts the task), so the
// engine needs no cooperation for them.
import { threadId, type MessagePort } from 'node:worker_threads';
import type { KhResultJson, RunDiagram } from '@/shared/api/runs';
import { khovanov, type KhResult, type Progress } from '@/shared/khovanov';
import { bandCertificate, type AfterHomology } from '@/shared/knot/bands';
import { writablePD } from '@/shared/knot/pd';
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
    if (task.diagram.bands) return { result: bandsRun(task.diagram, part(0)), threadId };
    const result = khovanov(pd, { ring: task.ring as 'Z', reduced: task.reduced, unknots, onProgress: part(0) });
    if (!task.computeS) return { result, threadId };
    const s = { Q: rasmussenS(pd, 'Q', { unknots, onProgress: part(1) }), F2: rasmussenS(pd, 'F2', { unknots, onProgress: part(2) }) };
    return { result: { ...result, s }, threadId };
  } finally {
    task.progress.close();
  }
}

// Kh over Z of the diagram after the bands is the run's table; the crossingless case needs no
// engine pass for the check, and gets one (immediate) for the table.
function bandsRun(d: RunDiagram, onProgress: (p: Progress) => void): KhResultJson {
  let kh: KhResult | undefined;
  const homology: AfterHomology = (after) => (kh = khovanov(after.pd, { ring: 'Z', unknots: after.unknots, onProgress })).groups;
  const saddles = d.bands!.map(([a, b]) => ({ a, b }));
  const { after, components, bands, unlink, chi, genusBound, ribbon } = bandCertificate({ pd: d.pd, unknots: d.unknots, saddles }, { maxCrossings: Infinity, homology });
  kh ??= khovanov(after.pd, { ring: 'Z', unknots: after.unknots });
  return { ...kh, bands: { after: { ...after, pd: writablePD(after.pd) }, components, bands, unlink, chi, genusBound, ribbon } };
}
