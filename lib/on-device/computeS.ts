// Native: no web worker; the engine runs after a frame, once the drawing has paused (the hook
// debounces), and a request aborted before it starts is never computed.
import { rasmussenS } from '@/shared/rasmussen';
import type { SRequest } from './local-s';
import { afterFrame } from './worker-call';

export const computeS = afterFrame((req: SRequest) => rasmussenS(req.pd, 'Q', { unknots: req.unknots }));
