// Native: no web worker; the engine runs after a frame, once the drawing has paused (the hook
// debounces), and a request aborted before it starts is never computed.
import { rasmussenS } from '@/shared/rasmussen';
import type { SRequest } from './local-s';

export function computeS(req: SRequest, signal: AbortSignal): Promise<number> {
  return new Promise((resolve, reject) => {
    setTimeout(() => {
      if (signal.aborted) return reject(new Error('superseded'));
      try {
        resolve(rasmussenS(req.pd, 'Q', { unknots: req.unknots }));
      } catch (err) {
        reject(err);
      }
    }, 0);
  });
}
