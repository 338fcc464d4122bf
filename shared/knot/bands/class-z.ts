// The class of a band surface in Khovanov homology over Z, up to an overall sign, by the route
// of class.ts: Kh^{0,c}(D'; Z) of a diagram D' of the c-component unlink is Z, and the births
// and the isotopy send 1 to one of its two generators (which one depends on the isotopy: the
// maps are defined up to sign, Jacobsson 2004, arXiv math/0206303). A generator is found
// without any Reidemeister map: Z^0 (the integer cycles) over B (the boundaries) is Z, so an
// integer functional psi vanishing on B restricts on Z^0 to mu phi, phi: Z^0 -> Z the
// isomorphism; on a basis k_j of Z^0 its values a_j have gcd |mu|, and sum x_j k_j with
// sum x_j a_j = gcd(a) is a generator (Bezout). The saddles backwards carry it to a cycle z of
// C^{0,chi}(K; Z), reduced modulo the boundaries to its Hermite normal form (linalg/lattice.ts).
//
// Basis of the answer: the enhanced states of C^{0,q}(K) (cube-levels.ts); the class is the
// normal form of z or of -z, whichever coefficient list (in basis order) is lexicographically
// greater, so its first nonzero coefficient is positive; two classes are equal up to sign
// exactly when these agree. Beside it, its reduction mod 2 as an F2 normal form (class.ts),
// which by the universal coefficient theorem is the class over F2, and the divisibility of its
// free part (from Smith forms: the torsion of C/(B + Z z) over that of C/B).

import * as Z from '../../linalg/int';
import { Int } from '../../linalg/int';
import { bezout, combine, dot, kernel, ZEchelon, ZVector } from '../../linalg/lattice';
import { smith } from '../../linalg/smith';
import { sparse } from '../../linalg/sparse';
import { backwards, ClassVector, f2NormalForm, odd, unlinkStart } from './class';
import { Cube, differential, enhancedState, EnhancedState, level, Level, Movie } from './cube-levels';
import { Stage } from './saddle';
import { BandError, Saddle } from './types';

export interface ClassVectorZ {
  /** The states with a nonzero coefficient in the normal form, and their coefficients. */
  support: EnhancedState[];
  coefficients: number[];
  /** The number of states of C^{0,q}(K) that are not pivots of the boundaries: the rank of C/B. */
  basisSize: number;
  /** The class mod 2 as class.ts gives it over F2. */
  mod2: ClassVector;
  /** The free part of the class is this times a primitive element (1: primitive); 0 for a torsion class. */
  divisibility: number;
}

const images = (d: (i: number) => [number, 1 | -1][], i: number): Map<number, Int> => {
  const out = new Map<number, Int>();
  for (const [j, s] of d(i)) out.set(j, Z.add(out.get(j) ?? 0, s));
  return combine(1, out, 0, new Map());
};

// The boundaries of `at`, the level (r, q), as the images of the generators one level below.
function boundaryRows(cube: Cube, r: number, q: number, at: Level): Map<number, Int>[] {
  if (r === 0) return [];
  const below = level(cube, r - 1, q);
  const d = differential(cube, below, at);
  return below.gens.map((_, i) => images(d, i));
}

/** A generator of Kh^{h,q} = Z^0/B when that group is Z: see the head of this file. */
export function generator(zeroCount: number, d0: (i: number) => Map<number, Int>, b: Map<number, Int>[]): Map<number, Int> {
  const cycles = [...kernel(zeroCount, d0)];
  // The functionals vanishing on B: the integer kernel of B's transpose (all of them when B = 0).
  const transpose = Array.from({ length: zeroCount }, () => new Map<number, Int>());
  b.forEach((row, j) => row.forEach((x, i) => transpose[i].set(j, x)));
  for (const psi of kernel(zeroCount, (i) => transpose[i])) {
    const a = cycles.map((k) => dot(psi, k));
    if (a.every(Z.isZero)) continue;
    let g: Int = 0;
    let chain: Map<number, Int> = new Map();
    a.forEach((aj, j) => {
      const [h, s, t] = bezout(g, aj);
      chain = combine(s, chain, t, cycles[j]);
      g = h;
    });
    return chain;
  }
  throw new Error('Kh^{0,c} of the after-bands diagram is zero: it is not the c-component unlink');
}

// At the first index where the coefficients differ, u's is the greater.
function lexGreater(u: ZVector, v: ZVector): boolean {
  for (const i of [...new Set([...u.keys(), ...v.keys()])].sort((x, y) => x - y)) {
    const d = Z.sign(Z.sub(u.get(i) ?? 0, v.get(i) ?? 0));
    if (d !== 0) return d > 0;
  }
  return true;
}

/**
 * The Z route's limit on the generators of C^{0,c}(D'), checked before any elimination: the
 * integer echelons here are far slower than F2's; 445 generators (P(3,-3,6), 12 crossings) took
 * about 0.1 s, 12,851 (P(5,-5,2), also 12) over 100 s.
 */
export const Z_GENERATORS = 2_000;

const product = (xs: Int[]): Int => xs.reduce<Int>((p, x) => Z.mul(p, x), 1);

/** The class over Z up to sign; arguments as classVector (class.ts). */
export function classVectorZ(stages: Stage[], saddles: Saddle[]): ClassVectorZ {
  const { m, n, nMinus, last, c, unlink, zeroLevel } = unlinkStart(stages);
  if (zeroLevel.gens.length > Z_GENERATORS) {
    throw new BandError(`the class over Z is computed up to ${Z_GENERATORS} generators of C^{0,${c}} of the unlink's cube; this one has ${zeroLevel.gens.length} (over F2 there is no such limit)`);
  }
  const d0 = nMinus < n ? differential(unlink, zeroLevel, level(unlink, nMinus + 1, c)) : () => [];
  const g = generator(zeroLevel.gens.length, (i) => images(d0, i), boundaryRows(unlink, nMinus, c, zeroLevel));
  const { chain, at } = backwards(m, stages, saddles, c, zeroLevel, g);
  return zNormalForm(m, stages[0], at, c - last, chain);
}

/** The class over Z up to sign of an integer cycle of C^{0,q} of `start` (`at` that level), with its reduction mod 2 and divisibility. */
export function zNormalForm(m: Movie, start: Stage, at: Level, q: number, chain: ZVector): ClassVectorZ {
  const { normal, basisSize, divisibility } = signedNormalForm(boundaryRows(m.cubeOf(start), m.nMinus, q, at), at.gens.length, chain);
  return {
    support: normal.map(([i]) => enhancedState(m, at, i)),
    coefficients: normal.map(([, x]) => x),
    basisSize,
    mod2: f2NormalForm(m, start, at, q, odd(chain)),
    divisibility,
  };
}

/**
 * In any basis of a free module of rank `count` with boundaries spanned by `rows`: the normal
 * form of +-chain (see the head of this file), the rank of C/B and the divisibility of the class.
 */
export function signedNormalForm(rows: ZVector[], count: number, chain: ZVector): { normal: [number, number][]; basisSize: number; divisibility: number } {
  const echelon = new ZEchelon();
  for (const row of rows) echelon.add(row);
  const [plus, minus] = [chain, combine(-1, chain, 0, new Map())].map((v) => echelon.reduce(v));
  const normal = [...(lexGreater(plus, minus) ? plus : minus)].sort((x, y) => x[0] - y[0]);

  const matrix = (extra: ZVector[]) => sparse(rows.length + extra.length, count, [...rows, ...extra].flatMap((r, i) => [...r].map(([j, x]) => [i, j, x] as const)), Z.add, Z.isZero);
  const [without, withZ] = [smith(matrix([])), smith(matrix([chain]))];
  const divisibility = withZ.rank === without.rank ? 0 : Z.divExact(product(withZ.invariants), product(without.invariants));
  return { normal: normal.map(([i, x]) => [i, safe(x)]), basisSize: count - echelon.rank, divisibility: safe(divisibility) };
}

function safe(x: Int): number {
  if (typeof x !== 'number') throw new RangeError(`a coefficient of the class, ${x}, is beyond the safe integers`);
  return x;
}
