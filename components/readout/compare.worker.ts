// A web worker comparing two sketches' band surfaces (local-compare.ts), off the page's thread.
import { compareSketches, type CompareRequest } from './local-compare';
import { answer } from '@/lib/on-device/worker-call';

self.onmessage = (e: MessageEvent<CompareRequest>) => {
  self.postMessage(answer(() => compareSketches(e.data)));
};
