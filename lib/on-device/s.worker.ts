// A web worker computing the Readout's s-invariant (over Q) with the same engine as the server,
// so the page stays responsive while it works.
import { rasmussenS } from '@/shared/rasmussen';
import type { SRequest } from './local-s';
import { answer } from './worker-call';

self.onmessage = (e: MessageEvent<SRequest>) => {
  self.postMessage(answer(() => rasmussenS(e.data.pd, 'Q', { unknots: e.data.unknots })));
};
