// Native: no web worker; the comparison is computed after a frame (worker-call.ts).
import { compareSketches } from './local-compare';
import { afterFrame } from '@/lib/on-device/worker-call';

export const computeCompare = afterFrame(compareSketches);
