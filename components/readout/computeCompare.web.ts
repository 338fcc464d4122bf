// Web: the comparison of band surfaces runs in its own web worker (worker-call.ts), beside the certificate's.
import type { CompareAnswer, CompareRequest } from './local-compare';
import { workerCall } from '@/lib/on-device/worker-call';

export const computeCompare = workerCall<CompareRequest, CompareAnswer>(() => new Worker(new URL('./compare.worker', import.meta.url)));
