// The class of a band surface over Z, up to an overall sign, on the local route: the movie of
// class-local.ts (T' simplified once over Z, closed per stage, the saddles applied there) with
// the start and the normal form of class-z.ts. Gaussian elimination over Z cancels only
// invertible entries (+-1), so T' is homotopy equivalent to T over Z (Bar-Natan, arXiv
// math/0606318, Lemma 4.2) and H(T' P_k; Z) = Kh(stage k; Z). The delooped basis of a closed
// object is the basis {1, x}^loops of Khovanov's algebra Z[x]/(x^2), in which a saddle is the
// merge or split with coefficients 1 (Khovanov, arXiv math/9908171).
//
// Basis of the answer: the generators of T' P_0 at (0, q) over Z, as in class-local.ts; T'
// over Z is not the F2 route's T', so these coordinates (and the mod 2 reduction given beside
// them) are comparable only with classes computed together here (localClassesZ).

import { F2Echelon } from '../../linalg/f2';
import * as Z from '../../linalg/int';
import { Int } from '../../linalg/int';
import { combine, ZVector } from '../../linalg/lattice';
import { integers } from '../../linalg/ring';
import { PDCode } from '../pd';
import { odd } from './class';
import { generator, signedNormalForm, Z_GENERATORS } from './class-z';
import { Carry, carryBack, closeAt, cutFor } from './class-local';
import { Stage } from './saddle';
import { BandError, Saddle } from './types';

export interface LocalClassVectorZ {
  /** The generators with a nonzero coefficient in the normal form, and their coefficients. */
  support: number[];
  coefficients: number[];
  /** The rank of C^{0,q}/B^{0,q} of T' P_0 over Z. */
  basisSize: number;
  /** The class mod 2 in the same generators, reduced modulo the boundaries mod 2. */
  mod2: { support: number[]; basisSize: number };
  /** The free part of the class is this times a primitive element (1: primitive); 0 for a torsion class. */
  divisibility: number;
}

const asVector = (entries: [number, Int][]): Map<number, Int> => combine(1, new Map(entries), 0, new Map());

function checked(count: number, c: number): void {
  if (count > Z_GENERATORS) throw new BandError(`the class over Z is computed up to ${Z_GENERATORS} generators of C^{0,${c}} of the simplified unlink; this one has ${count} (over F2 there is no such limit)`);
}

const zCarry: Carry<Int, ZVector> = {
  start(at, d, below, c) {
    checked(at.length, c);
    return generator(at.length, (i) => asVector(d(i)), below.map(asVector));
  },
  cross(v, images) {
    const out = new Map<number, Int>();
    for (const [i, x] of v) for (const j of images(i)) out.set(j, Z.add(out.get(j) ?? 0, x));
    return asVector([...out]);
  },
};

/** The classes over Z up to sign of several presentations of one code, with one cut; arguments as localClasses. */
export function localClassesZ(pd: PDCode, movies: readonly { stages: Stage[]; saddles: Saddle[] }[]): LocalClassVectorZ[] {
  const cut = cutFor(integers, pd, movies);
  const start = movies[0].stages[0];
  const k0 = closeAt(cut, start, start);
  return movies.map(({ stages, saddles }) => {
    const { v, q, at, d, below } = carryBack(cut, k0, stages, saddles, zCarry);
    checked(at.length, q);
    // The self-check: the image is a cycle of T' P_0 (the saddles are chain maps).
    const dv = new Map<number, Int>();
    for (const [i, x] of v) for (const [j, y] of d(i)) dv.set(j, Z.add(dv.get(j) ?? 0, Z.mul(x, y)));
    if ([...dv.values()].some((x) => !Z.isZero(x))) throw new Error('internal: the image of the unlink class under the bands is not a cycle');
    const { normal, basisSize, divisibility } = signedNormalForm(below.map(asVector), at.length, v);
    const e = new F2Echelon();
    for (const row of below) e.add(odd(asVector(row)));
    return { support: normal.map(([i]) => i), coefficients: normal.map(([, x]) => x), basisSize, mod2: { support: e.reduce(odd(v)), basisSize: at.length - e.rank }, divisibility };
  });
}
