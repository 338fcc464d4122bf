// The class of a band surface in Khovanov homology over F2, read backwards from the unlink.
//
// A surface F in B^4 with boundary K, given by b bands from K to a diagram D' of the c-component
// unlink, induces Kh(empty) -> Kh(K) (Khovanov, "An invariant of tangle cobordisms", 2006,
// arXiv math/0207264; Bar-Natan, "Khovanov's homology for tangles and cobordisms", 2005,
// arXiv math/0410495; well defined up to sign: Jacobsson, "An invariant of link cobordisms from
// Khovanov homology", 2004, arXiv math/0206303). Read as a movie from the empty link: c births,
// an isotopy from the crossingless unlink to D', then the b bands backwards as saddles. The
// births send 1 to 1 x ... x 1, the only generator of Kh(U_c) at (h, q) = (0, c), and each
// Reidemeister move is an isomorphism of bidegree (0, 0). Over F2, Kh^{0,c}(D') is therefore
// one-dimensional and the isotopy sends 1 to its nonzero class, whichever isotopy was used; so
// no Reidemeister chain map is needed: any cycle of C^{0,c}(D') that is not a boundary
// represents it. D' and K have the same crossings (and, the bands being orientable, the same
// signs), so their cubes have the same resolutions, and a saddle acts on every resolution as
// Khovanov's merge or split; each lowers q by one. The image is a cycle of C^{0,c-b}(K), the
// class of the surface (Sundberg and Swann, "Relative Khovanov-Jacobsson classes", 2021,
// arXiv 2103.01438), reduced modulo boundaries to its normal form (shared/linalg/f2.ts).
// Only the bidegrees (0, c) of D' and (0, c - b) of K and their neighbours in h are built.
//
// Basis of the answer: the enhanced states of C^{0,q}(K) (cube-levels.ts) that are not pivots
// of the boundaries' echelon form; these span C^{0,q}/B^{0,q} freely, which contains
// Kh^{0,q}(K). The class is the set of basis states in its normal form.

import { F2Vector, kernel, parity } from '../../linalg/f2';
import { add, Int, isZero, rem } from '../../linalg/int';
import { combine, ZVector } from '../../linalg/lattice';
import { Cube, differential, enhancedState, EnhancedState, f2Boundaries, level, Level, movie, Movie, saddleImages } from './cube-levels';
import { cycleCount, Stage } from './saddle';
import { Saddle } from './types';

export interface ClassVector {
  /** The enhanced states in the class's normal form (its coefficients 1; all others 0). */
  support: EnhancedState[];
  /** dim C^{0,q}/B^{0,q}: the length of the bit vector. */
  basisSize: number;
}

/**
 * The class of the surface as its normal form in C^{0,chi}(K), chi counted without the
 * crossingless unknots. `stages` as bandStages gives them, the last a diagram of the unlink
 * (the caller certifies it, and keeps n small: the cube has 2^n resolutions).
 */
export function classVector(stages: Stage[], saddles: Saddle[]): ClassVector {
  const { m, n, nMinus, last, c, unlink, zeroLevel } = unlinkStart(stages);
  // A cycle of C^{0,c}(D') that is not a boundary: the first kernel vector outside the boundaries.
  const d0 = nMinus < n ? differential(unlink, zeroLevel, level(unlink, nMinus + 1, c)) : () => [];
  const dBoundaries = f2Boundaries(unlink, nMinus, c, zeroLevel);
  let z: F2Vector | undefined;
  for (const k of kernel(zeroLevel.gens.length, (i) => parity(d0(i).map(([j]) => j)))) {
    const r = dBoundaries.reduce(k);
    if (r.length > 0) {
      z = r;
      break;
    }
  }
  if (!z) throw new Error('Kh^{0,c} of the after-bands diagram is zero over F2: it is not the c-component unlink');
  const image = backwards(m, stages, saddles, c, zeroLevel, new Map(z.map((i) => [i, 1])));
  return f2NormalForm(m, stages[0], image.at, c - last, odd(image.chain));
}

/**
 * Where both rings' routes start: the movie of the stages, the c components of the unlink D'
 * (the last stage), and D''s cube at its level (h, q) = (0, c), whose class the births give.
 */
export function unlinkStart(stages: Stage[]): { m: Movie; n: number; nMinus: number; last: number; c: number; unlink: Cube; zeroLevel: Level } {
  const m = movie(stages[0]);
  const last = stages.length - 1;
  const c = cycleCount(stages[last]);
  const unlink = m.cubeOf(stages[last]);
  return { m, n: m.n, nMinus: m.nMinus, last, c, unlink, zeroLevel: level(unlink, m.nMinus, c) };
}

/** The indices of the odd coefficients: the chain mod 2. */
export const odd = (v: ZVector): number[] => [...v].filter(([, x]) => !isZero(rem(x, 2))).map(([i]) => i).sort((p, q) => p - q);

/** The normal form over F2 of a chain of C^{0,q}(K) (`at` that level), as enhanced states. */
export function f2NormalForm(m: Movie, start: Stage, at: Level, q: number, chain: F2Vector): ClassVector {
  const kBoundaries = f2Boundaries(m.cubeOf(start), m.nMinus, q, at);
  return { support: kBoundaries.reduce(chain).map((i) => enhancedState(m, at, i)), basisSize: at.gens.length - kBoundaries.rank };
}

/**
 * The bands backwards, stage k -> stage k - 1, a saddle on every resolution, on a chain with
 * integer coefficients (merge and split have coefficients 1, so the same map serves F2).
 */
export function backwards(m: Movie, stages: Stage[], saddles: Saddle[], c: number, start: Level, chain: ZVector): { chain: ZVector; at: Level } {
  let from = start;
  let z = chain;
  const last = stages.length - 1;
  for (let k = last; k > 0; k--) {
    const cube = m.cubeOf(stages[k - 1]);
    const to = level(cube, m.nMinus, c - (last - k) - 1);
    const images = new Map<number, Int>();
    for (const [i, x] of z) for (const j of saddleImages(cube, from, to, saddles[k - 1], i)) images.set(j, add(images.get(j) ?? 0, x));
    z = combine(1, images, 0, new Map());
    from = to;
  }
  return { chain: z, at: from };
}
