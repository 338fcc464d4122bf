// The messages between the Readout and its s-invariant worker (s.worker.ts), and the size it
// takes on: s of a 20-crossing knot takes up to a few seconds on a phone; larger ones go to a run.
import type { PDCode } from '@/shared/knot/pd';

export const S_MAX_CROSSINGS = 20;

export interface SRequest {
  pd: PDCode;
  unknots: number;
}
