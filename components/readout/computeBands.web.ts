// Web: the band certificate runs in a web worker (worker-call.ts).
import type { BandsAnswer, BandsRequest } from './local-bands';
import { workerCall } from '@/lib/on-device/worker-call';

export const computeBands = workerCall<BandsRequest, BandsAnswer>(() => new Worker(new URL('./bands.worker', import.meta.url)));
