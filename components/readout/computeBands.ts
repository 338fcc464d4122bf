// Native: no web worker; the certificate is computed after a frame (worker-call.ts).
import { certifyBands } from './local-bands';
import { afterFrame } from '@/lib/on-device/worker-call';

export const computeBands = afterFrame(certifyBands);
