// Web: the on-device computation runs in a web worker (bundled by Metro from
// new Worker(new URL(...))). The worker is started when the form appears, so its script is
// already loaded if the network goes away later; one request at a time.
import type { KhResultJson } from '@/shared/api/runs';
import type { LocalMessage, LocalRequest } from './local-kh';

let worker: Worker | null = null;

export function warmUpLocal(): void {
  worker ??= new Worker(new URL('./kh.worker', import.meta.url));
}

export function computeLocally(req: LocalRequest, onProgress: (fraction: number) => void): Promise<KhResultJson> {
  warmUpLocal();
  const w = worker!;
  return new Promise((resolve, reject) => {
    w.onmessage = (e: MessageEvent<LocalMessage>) => {
      const m = e.data;
      if (m.type === 'progress') onProgress(m.fraction);
      else if (m.type === 'done') resolve(m.result);
      else reject(new Error(m.message));
    };
    w.onerror = (e) => {
      worker = null;
      w.terminate();
      reject(new Error(e.message || 'The on-device computation failed'));
    };
    w.postMessage(req);
  });
}
