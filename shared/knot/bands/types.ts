// The band presentation of a surface in the 4-ball, and the one error its functions throw.
import type { PDCode } from '../pd';

/** A band attached as a local saddle: edges a and b of the PD code border one common face and
 *  the band joins them across it (the drawing has already been isotoped, by finger moves, so
 *  that each band is a short straight saddle; its twists and the strands its core crosses are
 *  real crossings of the PD code). */
export interface Saddle {
  a: number;
  b: number;
}

/**
 * A link (PD code plus crossingless unknots, which bands cannot reach: give such a component a
 * kink first) and its bands in order. Band k names edges of the code after bands 1..k-1: after
 * the band {a, b}, label a is the edge from a's tail to b's head and b the edge from b's tail to
 * a's head (saddle.ts), so a later band on the far part of a's old edge names b.
 */
export interface BandPresentation {
  pd: PDCode;
  unknots: number;
  saddles: Saddle[];
}

/** A presentation refused: a missing edge, no common face, a non-orientable band, a size limit. */
export class BandError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BandError';
  }
}
