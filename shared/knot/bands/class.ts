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
// Basis of the answer: the enhanced states of C^{0,q}(K) (a resolution, and the circles of it
// labelled x, the others 1) that are not pivots of the boundaries' echelon form, ordered by
// resolution (as a binary number, bit k = crossing k) and then by x-mask; these span
// C^{0,q}/B^{0,q} freely, which contains Kh^{0,q}(K). The class is the set of basis states in its
// normal form. Crossingless unknots of the link carry 1 and are left out of the states.

import { edgeMap, resolve, State } from '../../khovanov/cube';
import { F2Echelon, F2Vector, kernel, parity } from '../../linalg/f2';
import { orient, PDCode } from '../pd';
import { cycleCount, Stage } from './saddle';

/** A generator of the cube complex: '0'/'1' per crossing in PD order, and the x-circles, each named by its smallest edge label. */
export interface EnhancedState {
  smoothing: string;
  x: number[];
}

export interface ClassVector {
  /** The enhanced states in the class's normal form (its coefficients 1; all others 0). */
  support: EnhancedState[];
  /** dim C^{0,q}/B^{0,q}: the length of the bit vector. */
  basisSize: number;
}

// The generators of C^{r - n_-, q} of one diagram.
interface Level {
  readonly states: number[];
  readonly circles: State[];
  readonly gens: { readonly s: number; readonly mask: number }[];
  readonly index: Map<number, number>[];
  readonly stateAt: Map<number, number>;
}

// All n-bit numbers with k bits set, ascending (Gosper's hack, common practice).
function withBits(n: number, k: number): number[] {
  if (k < 0 || k > n) return [];
  const out: number[] = [];
  for (let x = (1 << k) - 1; x < 1 << n; ) {
    out.push(x);
    if (x === 0) break;
    const low = x & -x;
    const ripple = x + low;
    x = ripple | (((x ^ ripple) >> 2) / low);
  }
  return out;
}

interface Cube {
  readonly pd: PDCode;
  readonly at: (label: number) => number;
  readonly labelIndex: ReadonlyMap<number, number>;
  /** n_+ - 2 n_- of the original link, the grading shift of every stage. */
  readonly shift: number;
}

function level(cube: Cube, r: number, q: number): Level {
  const states = withBits(cube.pd.length, r);
  const circles = states.map((s) => resolve(cube.pd, s, cube.labelIndex));
  const gens: { s: number; mask: number }[] = [];
  const index = circles.map((st, s) => {
    // q = circles - 2 (x-circles) + r + n_+ - 2 n_-.
    const twice = st.count + r + cube.shift - q;
    const masks = twice % 2 === 0 ? withBits(st.count, twice / 2) : [];
    return new Map(masks.map((mask) => [mask, gens.push({ s, mask }) - 1]));
  });
  return { states, circles, gens, index, stateAt: new Map(states.map((s, i) => [s, i])) };
}

// The cube differential from `from` (at r) to `to` (at r + 1), over F2.
function differential(cube: Cube, from: Level, to: Level): (i: number) => F2Vector {
  return (i) => {
    const { s, mask } = from.gens[i];
    const state = from.states[s];
    const out: number[] = [];
    cube.pd.forEach((x, k) => {
      if ((state >> k) & 1) return;
      const t = to.stateAt.get(state | (1 << k))!;
      for (const image of edgeMap(from.circles[s], to.circles[t], x, mask, cube.at)) {
        const j = to.index[t].get(image);
        if (j !== undefined) out.push(j);
      }
    });
    return parity(out);
  };
}

// The echelon form of the boundaries in `at`, the level (r, q) of the cube.
function boundaries(cube: Cube, r: number, q: number, at: Level): F2Echelon {
  const echelon = new F2Echelon();
  if (r === 0) return echelon;
  const below = level(cube, r - 1, q);
  const d = differential(cube, below, at);
  below.gens.forEach((_, i) => echelon.add(d(i)));
  return echelon;
}

/**
 * The class of the surface as its normal form in C^{0,chi}(K), chi counted without the
 * crossingless unknots. `stages` as bandStages gives them, the last a diagram of the unlink
 * (the caller certifies it, and keeps n small: the cube has 2^n resolutions).
 */
export function classVector(stages: Stage[], saddles: { a: number; b: number }[]): ClassVector {
  const pd = stages[0].pd;
  const n = pd.length;
  const signs = orient(pd).signs;
  const nMinus = signs.filter((s) => s < 0).length;
  const labels = [...new Set(pd.flat())].sort((p, q) => p - q);
  const labelIndex = new Map(labels.map((l, k) => [l, k]));
  const cubeOf = (stage: Stage): Cube => ({ pd: stage.pd, at: (l) => labelIndex.get(l)!, labelIndex, shift: n - 3 * nMinus });
  const last = stages.length - 1;
  const c = cycleCount(stages[last]);

  // A cycle of C^{0,c}(D') that is not a boundary: the first kernel vector outside the boundaries.
  const unlink = cubeOf(stages[last]);
  const zeroLevel = level(unlink, nMinus, c);
  const d0 = nMinus < n ? differential(unlink, zeroLevel, level(unlink, nMinus + 1, c)) : () => [];
  const dBoundaries = boundaries(unlink, nMinus, c, zeroLevel);
  let z: F2Vector | undefined;
  for (const k of kernel(zeroLevel.gens.length, d0)) {
    const r = dBoundaries.reduce(k);
    if (r.length > 0) {
      z = r;
      break;
    }
  }
  if (!z) throw new Error('Kh^{0,c} of the after-bands diagram is zero over F2: it is not the c-component unlink');

  // The bands backwards: stage k -> stage k - 1, a saddle on every resolution.
  let from = zeroLevel;
  for (let k = last; k > 0; k--) {
    const cube = cubeOf(stages[k - 1]);
    const to = level(cube, nMinus, c - (last - k) - 1);
    const { a, b } = saddles[k - 1];
    const images: number[] = [];
    for (const i of z) {
      const { s, mask } = from.gens[i];
      for (const image of edgeMap(from.circles[s], to.circles[s], [a, b, b], mask, cube.at)) images.push(to.index[s].get(image)!);
    }
    z = parity(images);
    from = to;
  }
  const kBoundaries = boundaries(cubeOf(stages[0]), nMinus, c - last, from);
  const normal = kBoundaries.reduce(z);
  const name = (st: State, circle: number): number => labels[st.of.indexOf(circle)];
  const support = normal.map((i) => {
    const { s, mask } = from.gens[i];
    const state = from.states[s];
    const st = from.circles[s];
    const x = Array.from({ length: st.count }, (_, circle) => circle).filter((circle) => (mask >> circle) & 1).map((circle) => name(st, circle));
    return { smoothing: Array.from({ length: n }, (_, k) => String((state >> k) & 1)).join(''), x: x.sort((p, q) => p - q) };
  });
  return { support, basisSize: from.gens.length - kBoundaries.rank };
}
