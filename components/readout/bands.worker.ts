// A web worker certifying the Slate's bands (local-bands.ts), off the page's thread.
import { certifyBands, type BandsRequest } from './local-bands';
import { answer } from '@/lib/on-device/worker-call';

self.onmessage = (e: MessageEvent<BandsRequest>) => {
  self.postMessage(answer(() => certifyBands(e.data)));
};
