// A web worker computing the Readout's s-invariant (over Q) with the same engine as the server,
// so the page stays responsive while it works.
import { rasmussenS } from '@/shared/rasmussen';
import type { SMessage, SRequest } from './local-s';

const post = (m: SMessage) => (self as unknown as { postMessage(m: SMessage): void }).postMessage(m);

self.onmessage = (e: MessageEvent<SRequest>) => {
  try {
    post({ type: 'done', s: rasmussenS(e.data.pd, 'Q', { unknots: e.data.unknots }) });
  } catch (err) {
    post({ type: 'error', message: err instanceof Error ? err.message : 'The computation failed' });
  }
};
