// Band presentations of surfaces in the 4-ball: the diagram after the bands, the genus and
// ribbon certificates, and the surface's class in Khovanov homology over F2 or Z (up to sign).
import type { PDCode } from '../pd';
import { AfterBands, simplifiedStage } from './after';
import { AfterHomology, BandCertificate, certify } from './certificate';
import { classVector } from './class';
import { classVectorZ } from './class-z';
import { localClasses } from './class-local';
import { localClassesZ } from './class-local-z';
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

/** The cube's default crossing limit for the class (class.ts, class-z.ts). */
export const CLASS_CROSSINGS = 14;

/**
 * The local route's limits (class-local.ts; over Z class-local-z.ts), past the cube's: crossings, and edges the
 * bands touch (each cut open for the whole computation, two open ends an edge, so the complex
 * grows with them). Measured in tests/bench/bands.bench.ts (load about 4): a 40-crossing pretzel
 * with one band in 0.3 s; three bands on six edges (9_46^#3, 27 crossings) in 0.8 s, peak 0.3 GB;
 * four bands on eight edges (9_46^#4, at load 12) took 68 s and 2.5 GB, five ran out of memory. Crossings
 * are limited below the pretzels' 40 since other diagrams give wider tangles (the unlink check's
 * Kh of 30-crossing diagrams took 11 s to 190 s: certificate.ts). On wide diagrams, 8_20 as a
 * closed 3-braid stabilized to 6 to 10 strands and conjugated by random braids, one band (load
 * 10): 29 to 43 crossings took 0.8 s to 5.5 s (eight codes), 47 to 57 up to 6 s (four), but one of 47 on 10
 * strands 281 s and 2.3 GB, so the limit stays at 30. Over Z (class-local-z.ts) the times were
 * those over F2 (50 crossings, 3 strands: 5.4 s against 5.5 s). Bands on one edge already share
 * its cut; gluing the crossings at cut edges last (load 10) took 9_46^#4 from 68 s and 2.0 GB to
 * 59 s and 1.5 GB but 9_46^#3 from 2.9 s to 4.8 s, so the order and the 6 edges stay.
 */
export const LOCAL_CLASS_CROSSINGS = 30;
export const LOCAL_CLASS_EDGES = 6;

/** How the class was computed, which fixes the basis of its coordinates. */
export type ClassBasis = 'cube' | 'local';

/** A generator of the simplified complex of the local route (class-local.ts), by its number. */
export interface LocalGenerator {
  generator: number;
}

/** The coefficient ring of the class: F2, or Z with the class up to an overall sign. */
export type ClassRing = 'F2' | 'Z';

export interface SurfaceClass {
  ring: ClassRing;
  /** 'cube': coordinates on enhanced states (class.ts, class-z.ts); 'local': on generators of the simplified complex (class-local.ts, class-local-z.ts). */
  basis: ClassBasis;
  /** Bidegree of the class: h = 0, q = chi. */
  h: number;
  q: number;
  zero: boolean;
  /**
   * The class by its nonzero coefficients in the basis of enhanced states (F2: class.ts, the
   * states outside the boundaries' pivots; Z: class-z.ts, the Hermite normal form with the sign
   * that makes the first nonzero coefficient positive), or on the local route in the basis of
   * class-local.ts: comparable only with classes of the same code computed together
   * (compareSurfaces).
   */
  support: (EnhancedState | LocalGenerator)[];
  /** The coefficient of each state of `support` (all 1 over F2). */
  coefficients: number[];
  /** The rank of C^{0,q}/B^{0,q} of the code's cube (or of the simplified complex): the number of basis elements outside the pivots. */
  basisSize: number;
  /** Over Z: the class mod 2, the class over F2 by universal coefficients. */
  mod2?: { support: (EnhancedState | LocalGenerator)[]; basisSize: number };
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
  /** The cube's limit, default CLASS_CROSSINGS: the cube has 2^n resolutions. */
  maxCrossings?: number;
  /** Past the cube's limit, the local route's, default LOCAL_CLASS_CROSSINGS; 0 turns it off. */
  localCrossings?: number;
  /** The local route's limit on the edges the bands touch, default LOCAL_CLASS_EDGES. */
  localEdges?: number;
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
 * The class of the surface in Kh^{0,chi}(K; F2) (class.ts; past the cube's limit class-local.ts)
 * or Kh^{0,chi}(K; Z) up to sign (class-z.ts; past the cube's limit class-local-z.ts). BandError unless the bands end at a certified
 * unlink, or when the code is over the limits.
 */
export function surfaceClass(p: BandPresentation, opts: ClassOptions = {}): SurfaceClass {
  return classesOf(p.pd, p.unknots, [p.saddles], opts)[0];
}

/** Two presentations on the same PD code (the union of both sets of finger moves): do their classes differ? */
export function compareSurfaces(pd: PDCode, unknots: number, a: Saddle[], b: Saddle[], opts: ClassOptions = {}): SurfaceComparison {
  const [ca, cb] = classesOf(pd, unknots, [a, b], opts);
  return compared(ca, cb);
}

/**
 * The class of p carried to the knot's own diagram `fingers.common`, the fingers that made the
 * bands short saddles taken back (common-class.ts). BandError when they cannot be.
 */
export function surfaceClassOn(p: BandPresentation, fingers: Fingers, opts: ClassOptions = {}): SurfaceClass {
  if (p.unknots > 0) throw new BandError('the class is carried to a knot drawing of one connected piece; this presentation has crossingless unknots');
  // The chain maps act on the cube, so the class is the cube's (the local route's basis is another).
  return carriedClass(p.pd, surfaceClass(p, { ...opts, localCrossings: 0 }), fingers);
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
  // Normal forms are canonical (over Z with the sign fixed; on the local route for classes computed together), so the classes agree exactly when bidegree and coefficients do.
  const key = (c: SurfaceClass): string => JSON.stringify([c.q, c.support, c.coefficients]);
  const same = (ca.zero && cb.zero) || key(ca) === key(cb);
  const equal = ca.ring === 'Z' ? 'equal up to sign: no conclusion' : 'equal: no conclusion';
  return { verdict: same ? equal : 'differ', a: ca, b: cb };
}

/** The classes of presentations on one code, each route's limits checked before any work. */
function classesOf(pd: PDCode, unknots: number, bands: Saddle[][], opts: ClassOptions): SurfaceClass[] {
  const ring = opts.ring ?? 'F2';
  const cubeLimit = opts.maxCrossings ?? CLASS_CROSSINGS;
  const localLimit = opts.localCrossings ?? LOCAL_CLASS_CROSSINGS;
  const basis: ClassBasis = pd.length <= cubeLimit ? 'cube' : 'local';
  // The cheap fact first: the cube has 2^n resolutions.
  if (basis === 'local' && pd.length > localLimit) {
    const local = localLimit > cubeLimit ? ` and by the local algorithm up to ${localLimit}` : '';
    throw new BandError(`the class is computed on the cube of resolutions, up to ${cubeLimit} crossings${local}; this diagram has ${pd.length}`);
  }
  const edges = new Set(bands.flat().flatMap(({ a, b }) => [a, b])).size;
  const edgeLimit = opts.localEdges ?? LOCAL_CLASS_EDGES;
  if (basis === 'local' && edges > edgeLimit) {
    throw new BandError(`past ${cubeLimit} crossings the class is computed by the local algorithm with the bands' edges cut open, up to ${edgeLimit} edges; these bands touch ${edges}`);
  }
  const presentations = bands.map((saddles) => ({ pd, unknots, saddles }));
  const stages = presentations.map(bandStages);
  // No crossings, so no edges and no bands: the unknots' disks, 1 x ... x 1.
  if (pd.length === 0) {
    const one = { support: [{ smoothing: '', x: [] }], basisSize: 1 };
    return bands.map(() => ({ ring, basis, h: 0, q: unknots, zero: false, ...one, coefficients: [1], ...(ring === 'Z' ? { mod2: one, divisibility: 1 } : {}) }));
  }
  const certs = presentations.map((p, k) => certify(p, stages[k], opts.unlinkCrossings));
  for (const cert of certs) {
    if (cert.unlink === 'none' || cert.unlink === 'too-large') {
      throw new BandError(`the class needs the bands to end at a certified unlink; the result is ${cert.unlink === 'none' ? 'not an unlink' : `too large to check (over ${cert.maxCrossings} crossings)`}`);
    }
  }
  const f2 = (v: { support: (EnhancedState | LocalGenerator)[]; basisSize: number }) => ({ ...v, coefficients: v.support.map(() => 1) });
  const movies = bands.map((saddles, k) => ({ stages: stages[k], saddles }));
  const generators = (support: number[]) => support.map((generator) => ({ generator }));
  const local = (): Omit<SurfaceClass, 'ring' | 'basis' | 'h' | 'q' | 'zero'>[] =>
    ring === 'Z'
      ? localClassesZ(pd, movies).map((v) => ({ ...v, support: generators(v.support), mod2: { support: generators(v.mod2.support), basisSize: v.mod2.basisSize } }))
      : localClasses(pd, movies).map((v) => f2({ support: generators(v.support), basisSize: v.basisSize }));
  const found = basis === 'local' ? local() : bands.map((saddles, k) => (ring === 'Z' ? classVectorZ(stages[k], saddles) : f2(classVector(stages[k], saddles))));
  return found.map((v, k) => ({ ...v, ring, basis, h: 0, q: certs[k].chi, zero: v.support.length === 0 }));
}
