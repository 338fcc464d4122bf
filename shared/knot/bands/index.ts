// Band presentations of surfaces in the 4-ball: the diagram after the bands, the genus and
// ribbon certificates, and the surface's class in Khovanov homology over F2.
import type { PDCode } from '../pd';
import { AfterBands, simplifiedStage } from './after';
import { BandCertificate, certify } from './certificate';
import { classVector, EnhancedState } from './class';
import { bandStages } from './saddle';
import { BandError, BandPresentation, Saddle } from './types';

export { BandError } from './types';
export type { BandPresentation, Saddle } from './types';
export type { AfterBands } from './after';
export type { BandCertificate, UnlinkCertificate } from './certificate';
export { UNLINK_CROSSINGS } from './certificate';
export type { EnhancedState } from './class';

/** The cube's default crossing limit for the class. */
export const CLASS_CROSSINGS = 14;

export interface SurfaceClass {
  /** Bidegree of the class: h = 0, q = chi. */
  h: number;
  q: number;
  zero: boolean;
  /** The class as a bit vector over F2, listed by its 1 entries (basis: shared/knot/bands/class.ts). */
  support: EnhancedState[];
  /** The length of the bit vector: dim C^{0,q}/B^{0,q} of the code's cube. */
  basisSize: number;
}

export interface SurfaceComparison {
  /** 'differ': the classes are different elements of Kh(K; F2), so the surfaces are not isotopic rel boundary. */
  verdict: 'differ' | 'equal: no conclusion';
  a: SurfaceClass;
  b: SurfaceClass;
}

/** The diagram after all band moves, simplified by Reidemeister moves (shared/knot/moves). */
export function afterBands(p: BandPresentation): AfterBands {
  const stages = bandStages(p);
  return simplifiedStage(stages[stages.length - 1], p.unknots);
}

/**
 * Components, bands, Euler characteristic, genus bound and unlink certificate (certificate.ts).
 * maxCrossings (default UNLINK_CROSSINGS) limits the Khovanov check of the simplified result.
 */
export function bandCertificate(p: BandPresentation, opts: { maxCrossings?: number } = {}): BandCertificate {
  return certify(p, bandStages(p), opts.maxCrossings);
}

/**
 * The class of the surface in Kh^{0,chi}(K; F2) (class.ts). BandError unless the bands end at a
 * certified unlink, or when the code has more than maxCrossings (default CLASS_CROSSINGS).
 */
export function surfaceClass(p: BandPresentation, opts: { maxCrossings?: number; unlinkCrossings?: number } = {}): SurfaceClass {
  const maxCrossings = opts.maxCrossings ?? CLASS_CROSSINGS;
  // The cheap fact first: the cube has 2^n resolutions.
  if (p.pd.length > maxCrossings) throw new BandError(`the class is computed on the cube of resolutions, up to ${maxCrossings} crossings; this diagram has ${p.pd.length}`);
  const stages = bandStages(p);
  // No crossings, so no edges and no bands: the unknots' disks, 1 x ... x 1.
  if (p.pd.length === 0) return { h: 0, q: p.unknots, zero: false, support: [{ smoothing: '', x: [] }], basisSize: 1 };
  const cert = certify(p, stages, opts.unlinkCrossings);
  if (cert.unlink === 'none' || cert.unlink === 'too-large') {
    throw new BandError(`the class needs the bands to end at a certified unlink; the result is ${cert.unlink === 'none' ? 'not an unlink' : `too large to check (over ${cert.maxCrossings} crossings)`}`);
  }
  const { support, basisSize } = classVector(stages, p.saddles);
  return { h: 0, q: cert.chi, zero: support.length === 0, support, basisSize };
}

/** Two presentations on the same PD code (the union of both sets of finger moves): do their classes differ? */
export function compareSurfaces(pd: PDCode, unknots: number, a: Saddle[], b: Saddle[], opts: { maxCrossings?: number; unlinkCrossings?: number } = {}): SurfaceComparison {
  const ca = surfaceClass({ pd, unknots, saddles: a }, opts);
  const cb = surfaceClass({ pd, unknots, saddles: b }, opts);
  // Normal forms are canonical, so the classes agree exactly when bidegree and support do.
  const key = (c: SurfaceClass): string => JSON.stringify([c.q, c.support]);
  const same = (ca.zero && cb.zero) || key(ca) === key(cb);
  return { verdict: same ? 'equal: no conclusion' : 'differ', a: ca, b: cb };
}
