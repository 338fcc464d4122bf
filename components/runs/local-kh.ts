// The messages between the page and the on-device Khovanov worker (kh.worker.ts), and the
// size it takes on: small diagrams only, so the phone stays responsive.
import type { KhResultJson, RunDiagram } from '@/shared/api/runs';

export const LOCAL_MAX_CROSSINGS = 12;

export interface LocalRequest {
  pd: RunDiagram['pd'];
  unknots: number;
  ring: string;
  reduced: boolean;
}

export type LocalMessage =
  | { type: 'progress'; fraction: number }
  | { type: 'done'; result: KhResultJson }
  | { type: 'error'; message: string };
