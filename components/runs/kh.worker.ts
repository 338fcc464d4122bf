// A web worker computing Khovanov homology on the device with the same engine as the server,
// so small diagrams work offline without blocking the page.
import { khovanov, type KhRing } from '@/shared/khovanov';
import type { LocalRequest, LocalMessage } from './local-kh';

const post = (m: LocalMessage) => (self as { postMessage(m: LocalMessage): void }).postMessage(m);

self.onmessage = (e: MessageEvent<LocalRequest>) => {
  const { pd, unknots, ring, reduced } = e.data;
  try {
    const result = khovanov(pd, { ring: ring as KhRing, reduced, unknots: pd.length === 0 ? Math.max(1, unknots) : unknots, onProgress: (p) => post({ type: 'progress', fraction: p.fraction }) });
    post({ type: 'done', result });
  } catch (err) {
    post({ type: 'error', message: err instanceof Error ? err.message : 'The computation failed' });
  }
};
