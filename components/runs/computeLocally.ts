// Native: no web worker; small diagrams take milliseconds, so the engine runs after a frame.
import type { KhResultJson } from '@/shared/api/runs';
import { khovanov, type KhRing } from '@/shared/khovanov';
import type { LocalRequest } from './local-kh';

/** Nothing to start ahead on native. */
export function warmUpLocal(): void {}

export function computeLocally(req: LocalRequest, onProgress: (fraction: number) => void): Promise<KhResultJson> {
  return new Promise((resolve, reject) => {
    setTimeout(() => {
      try {
        resolve(khovanov(req.pd, { ring: req.ring as KhRing, reduced: req.reduced, unknots: req.pd.length === 0 ? Math.max(1, req.unknots) : req.unknots, onProgress: (p) => onProgress(p.fraction) }));
      } catch (err) {
        reject(err);
      }
    }, 0);
  });
}
