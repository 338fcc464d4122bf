// Band presentations of surfaces in the 4-ball: the diagram after the bands, the genus and
// ribbon certificates, and the surface's class in Khovanov homology.
import type { PDCode } from '../pd';

/** A band attached as a local saddle: edges a and b of the PD code border one common face and
 *  the band joins them across it (the drawing has already been isotoped, by finger moves, so
 *  that each band is a short straight saddle; its twists and the strands its core crosses are
 *  real crossings of the PD code). */
export interface Saddle {
  a: number;
  b: number;
}

export interface BandPresentation {
  pd: PDCode;
  unknots: number;
  saddles: Saddle[];
}

export class BandError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BandError';
  }
}

export interface AfterBands {
  pd: PDCode;
  unknots: number;
  components: number;
}

export type UnlinkCertificate = 'crossingless' | 'khovanov' | 'none' | 'too-large';

export interface BandCertificate {
  /** Components of the link before the bands. */
  knotComponents: number;
  /** c: components after the bands. */
  components: number;
  /** b: the number of bands. */
  bands: number;
  /** Euler characteristic of the surface in B^4 (bands plus c capping disks): chi = c - b. */
  chi: number;
  /** Upper bound on the 4-ball genus; null unless the result is a certified unlink. */
  genusBound: number | null;
  unlink: UnlinkCertificate;
  /** Certified unlink and c = b + 1 for a knot. */
  ribbon: boolean;
  after: AfterBands;
  /** The crossing limit used for the Khovanov check of the after-bands diagram. */
  maxCrossings: number;
}

export interface SurfaceClass {
  /** Bidegree of the class: h = 0, q = chi. */
  h: number;
  q: number;
  zero: boolean;
}

export interface SurfaceComparison {
  verdict: 'differ' | 'equal: no conclusion';
  a: SurfaceClass;
  b: SurfaceClass;
}

const notYet = (): never => {
  throw new Error('not yet');
};

/** The diagram after all band moves, simplified by Reidemeister moves (shared/knot/moves). */
export function afterBands(p: BandPresentation): AfterBands {
  return notYet() ?? p;
}

export function bandCertificate(p: BandPresentation, opts?: { maxCrossings?: number }): BandCertificate {
  return notYet() ?? [p, opts];
}

export function surfaceClass(p: BandPresentation, opts?: { maxCrossings?: number }): SurfaceClass {
  return notYet() ?? [p, opts];
}

export function compareSurfaces(pd: PDCode, unknots: number, a: Saddle[], b: Saddle[], opts?: { maxCrossings?: number }): SurfaceComparison {
  return notYet() ?? [pd, unknots, a, b, opts];
}
