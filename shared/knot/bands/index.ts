// Band presentations of surfaces in the 4-ball: the diagram after the bands, the genus and
// ribbon certificates, and the surface's class in Khovanov homology over F2 or Z (up to sign).
import type { PDCode } from '../pd';
import { AfterBands, simplifiedStage } from './after';
import { AfterHomology, BandCertificate, certify } from './certificate';
import { ClassVector, classVector } from './class';
import { classVectorZ } from './class-z';
import { EnhancedState } from './cube-levels';
import { bandStages } from './saddle';
import { Fingers } from './carry';
import { carriedClass } from './common-class';
import { BandError, BandPresentation, Saddle } from './types';

export { BandError } from './types';
export { bandStages } from './saddle';
export type { BandPresentation, Saddle } from './types';
export type { AfterBands } from './after';
export type { AfterHomology, BandCertificate, UnlinkCertificate } from './certificate';
export { UNLINK_CROSSINGS } from './certificate';
export type { EnhancedState } from './cube-levels';
export type { Fingers } from './carry';

/** The cube's default crossing limit for the class. */
export const CLASS_CROSSINGS = 14;

/** The coefficient ring of the class: F2, or Z with the class up to an overall sign. */
export type ClassRing = 'F2' | 'Z';

export interface SurfaceClass {
  ring: ClassRing;
  /** Bidegree of the class: h = 0, q = chi. */
  h: number;
  q: number;
  zero: boolean;
  /**
   * The class by its nonzero coefficients in the basis of enhanced states (F2: class.ts, the
   * states outside the boundaries' pivots; Z: class-z.ts, the Hermite normal form with the sign
   * that makes the first nonzero coefficient positive).
   */
  support: EnhancedState[];
  /** The coefficient of each state of `support` (all 1 over F2). */
  coefficients: number[];
  /** The rank of C^{0,q}/B^{0,q} of the code's cube: the number of states outside the pivots. */
  basisSize: number;
  /** Over Z: the class mod 2, the class over F2 by universal coefficients. */
  mod2?: { support: EnhancedState[]; basisSize: number };
  /** Over Z: the free part of the class is this times a primitive element (1: primitive); 0 for a torsion class. */
  divisibility?: number;
}

export interface SurfaceComparison {
  /** 'differ': the classes are different elements of Kh(K) (over Z, not even up to sign), so the surfaces are not isotopic rel boundary. */
  verdict: 'differ' | 'equal: no conclusion' | 'equal up to sign: no conclusion';
  a: SurfaceClass;
  b: SurfaceClass;
}

export interface ClassOptions {
  /** Default CLASS_CROSSINGS: the cube has 2^n resolutions. */
  maxCrossings?: number;
  /** The Khovanov unlink check's limit (certificate.ts). */
  unlinkCrossings?: number;
  /** Default F2. */
  ring?: ClassRing;
}

/** The diagram after all band moves, simplified by Reidemeister moves (shared/knot/moves). */
export function afterBands(p: BandPresentation): AfterBands {
  const stages = bandStages(p);
  return simplifiedStage(stages[stages.length - 1], p.unknots);
}

/**
 * Components, bands, Euler characteristic, genus bound and unlink certificate (certificate.ts).
 * maxCrossings (default UNLINK_CROSSINGS) limits the Khovanov check of the simplified result;
 * `homology` replaces the engine call that check makes (a server run reports its progress).
 */
export function bandCertificate(p: BandPresentation, opts: { maxCrossings?: number; homology?: AfterHomology } = {}): BandCertificate {
  return certify(p, bandStages(p), opts.maxCrossings, opts.homology);
}

/**
 * The class of the surface in Kh^{0,chi}(K; F2) (class.ts) or Kh^{0,chi}(K; Z) up to sign
 * (class-z.ts). BandError unless the bands end at a certified unlink, or when the code has more
 * than maxCrossings.
 */
export function surfaceClass(p: BandPresentation, opts: ClassOptions = {}): SurfaceClass {
  const ring = opts.ring ?? 'F2';
  const maxCrossings = opts.maxCrossings ?? CLASS_CROSSINGS;
  // The cheap fact first: the cube has 2^n resolutions.
  if (p.pd.length > maxCrossings) throw new BandError(`the class is computed on the cube of resolutions, up to ${maxCrossings} crossings; this diagram has ${p.pd.length}`);
  const stages = bandStages(p);
  // No crossings, so no edges and no bands: the unknots' disks, 1 x ... x 1.
  if (p.pd.length === 0) {
    const one = { support: [{ smoothing: '', x: [] }], basisSize: 1 };
    return { ring, h: 0, q: p.unknots, zero: false, ...one, coefficients: [1], ...(ring === 'Z' ? { mod2: one, divisibility: 1 } : {}) };
  }
  const cert = certify(p, stages, opts.unlinkCrossings);
  if (cert.unlink === 'none' || cert.unlink === 'too-large') {
    throw new BandError(`the class needs the bands to end at a certified unlink; the result is ${cert.unlink === 'none' ? 'not an unlink' : `too large to check (over ${cert.maxCrossings} crossings)`}`);
  }
  const f2 = (v: ClassVector) => ({ ...v, coefficients: v.support.map(() => 1) });
  const found = ring === 'Z' ? classVectorZ(stages, p.saddles) : f2(classVector(stages, p.saddles));
  return { ...found, ring, h: 0, q: cert.chi, zero: found.support.length === 0 };
}

/** Two presentations on the same PD code (the union of both sets of finger moves): do their classes differ? */
export function compareSurfaces(pd: PDCode, unknots: number, a: Saddle[], b: Saddle[], opts: ClassOptions = {}): SurfaceComparison {
  return compared(surfaceClass({ pd, unknots, saddles: a }, opts), surfaceClass({ pd, unknots, saddles: b }, opts));
}

/**
 * The class of p carried to the knot's own diagram `fingers.common`, the fingers that made the
 * bands short saddles taken back (common-class.ts). BandError when they cannot be.
 */
export function surfaceClassOn(p: BandPresentation, fingers: Fingers, opts: ClassOptions = {}): SurfaceClass {
  if (p.unknots > 0) throw new BandError('the class is carried to a knot drawing of one connected piece; this presentation has crossingless unknots');
  return carriedClass(p.pd, surfaceClass(p, opts), fingers);
}

/** Two presentations with their own fingers over one knot diagram (the same `fingers.common`): do their classes differ? */
export function compareOnDiagram(a: Placed, b: Placed, opts: ClassOptions = {}): SurfaceComparison {
  if (JSON.stringify(a.fingers.common) !== JSON.stringify(b.fingers.common)) throw new BandError('the presentations are drawn on different diagrams');
  return compared(surfaceClassOn(a.presentation, a.fingers, opts), surfaceClassOn(b.presentation, b.fingers, opts));
}

/** A presentation and where its code sits over the knot's own diagram. */
export interface Placed {
  presentation: BandPresentation;
  fingers: Fingers;
}

function compared(ca: SurfaceClass, cb: SurfaceClass): SurfaceComparison {
  // Normal forms are canonical (over Z with the sign fixed), so the classes agree exactly when bidegree and coefficients do.
  const key = (c: SurfaceClass): string => JSON.stringify([c.q, c.support, c.coefficients]);
  const same = (ca.zero && cb.zero) || key(ca) === key(cb);
  const equal = ca.ring === 'Z' ? 'equal up to sign: no conclusion' : 'equal: no conclusion';
  return { verdict: same ? equal : 'differ', a: ca, b: cb };
}
