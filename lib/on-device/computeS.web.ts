// Web: the s-invariant runs in a web worker (worker-call.ts), so the page stays responsive.
import type { SRequest } from './local-s';
import { workerCall } from './worker-call';

export const computeS = workerCall<SRequest, number>(() => new Worker(new URL('./s.worker', import.meta.url)));
