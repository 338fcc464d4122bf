// Web: the s-invariant runs in a web worker (bundled by Metro from new Worker(new URL(...)), as
// components/runs/computeLocally.web.ts does). One request at a time: aborting a request that
// is still being computed stops its worker (the engine cannot be interrupted from outside), and
// the next request starts a fresh one.
import type { SMessage, SRequest } from './local-s';

let worker: Worker | null = null;

export function computeS(req: SRequest, signal: AbortSignal): Promise<number> {
  const w = (worker ??= new Worker(new URL('./s.worker', import.meta.url)));
  return new Promise((resolve, reject) => {
    const stop = () => {
      if (worker === w) worker = null;
      w.terminate();
    };
    const onAbort = () => {
      stop();
      reject(new Error('superseded'));
    };
    signal.addEventListener('abort', onAbort, { once: true });
    const settle = (done: () => void) => {
      signal.removeEventListener('abort', onAbort);
      done();
    };
    w.onmessage = (e: MessageEvent<SMessage>) => {
      const m = e.data;
      settle(() => (m.type === 'done' ? resolve(m.s) : reject(new Error(m.message))));
    };
    w.onerror = (e) =>
      settle(() => {
        stop();
        reject(new Error(e.message || 'The on-device computation failed'));
      });
    w.postMessage(req);
  });
}
