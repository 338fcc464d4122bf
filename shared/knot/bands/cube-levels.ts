// The pieces of Khovanov's cube complex (Khovanov 2000, arXiv math/9908171; gradings of
// Bar-Natan 2002, arXiv math/0201043) that the class of a band surface needs: one bidegree of
// every stage of the band movie, its differential with Khovanov's signs, and a saddle on every
// resolution. All stages share the link's crossings and labels, so they share one numbering.
//
// Basis of a level C^{h,q}: the enhanced states (a resolution and the circles of it labelled x,
// the others 1), ordered by resolution (as a binary number, bit k = crossing k) and then by
// x-mask. Crossingless unknots of the link carry 1 and are left out of the states.

import { edgeMap, resolve, State } from '../../khovanov/cube';
import { F2Echelon, parity } from '../../linalg/f2';
import { orient, PDCode } from '../pd';
import { Saddle } from './types';
import { Stage } from './saddle';

/** A generator of the cube complex: '0'/'1' per crossing in PD order, and the x-circles, each named by its smallest edge label. */
export interface EnhancedState {
  smoothing: string;
  x: number[];
}

/** The generators of C^{r - n_-, q} of one stage. */
export interface Level {
  readonly states: number[];
  readonly circles: State[];
  readonly gens: { readonly s: number; readonly mask: number }[];
  readonly index: Map<number, number>[];
  readonly stateAt: Map<number, number>;
}

export interface Cube {
  readonly pd: PDCode;
  readonly at: (label: number) => number;
  readonly labelIndex: ReadonlyMap<number, number>;
  /** n_+ - 2 n_- of the original link, the grading shift of every stage. */
  readonly shift: number;
}

/** The cubes of a movie's stages, and what they share. */
export interface Movie {
  readonly cubeOf: (stage: Stage) => Cube;
  readonly n: number;
  readonly nMinus: number;
  readonly labels: number[];
}

export function movie(start: Stage): Movie {
  const n = start.pd.length;
  const nMinus = orient(start.pd).signs.filter((s) => s < 0).length;
  const labels = [...new Set(start.pd.flat())].sort((p, q) => p - q);
  const labelIndex = new Map(labels.map((l, k) => [l, k]));
  const cubeOf = (stage: Stage): Cube => ({ pd: stage.pd, at: (l) => labelIndex.get(l)!, labelIndex, shift: n - 3 * nMinus });
  return { cubeOf, n, nMinus, labels };
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

/** The generators at r ones (h = r - n_-) and quantum degree q. */
export function level(cube: Cube, r: number, q: number): Level {
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

/** The cube differential from `from` (at r) to `to` (at r + 1): generator i's images with Khovanov's signs (-1)^(ones before k). */
export function differential(cube: Cube, from: Level, to: Level): (i: number) => [number, 1 | -1][] {
  return (i) => {
    const { s, mask } = from.gens[i];
    const state = from.states[s];
    const out: [number, 1 | -1][] = [];
    cube.pd.forEach((x, k) => {
      if ((state >> k) & 1) return;
      const t = to.stateAt.get(state | (1 << k))!;
      let ones = 0;
      for (let m = state & ((1 << k) - 1); m; m &= m - 1) ones++;
      for (const image of edgeMap(from.circles[s], to.circles[t], x, mask, cube.at)) {
        const j = to.index[t].get(image);
        if (j !== undefined) out.push([j, ones % 2 ? -1 : 1]);
      }
    });
    return out;
  };
}

/**
 * The images of generator i of a later stage under the saddle `band` read backwards, on its own
 * resolution: a merge or split commutes with every edge map of the cube, so this is a chain map.
 */
export function saddleImages(cube: Cube, from: Level, to: Level, { a, b }: Saddle, i: number): number[] {
  const { s, mask } = from.gens[i];
  return edgeMap(from.circles[s], to.circles[s], [a, b, b], mask, cube.at).map((image) => to.index[s].get(image)!);
}

/** The echelon form over F2 of the boundaries in `at`, the level (r, q) of the cube. */
export function f2Boundaries(cube: Cube, r: number, q: number, at: Level): F2Echelon {
  const echelon = new F2Echelon();
  if (r === 0) return echelon;
  const below = level(cube, r - 1, q);
  const d = differential(cube, below, at);
  below.gens.forEach((_, i) => echelon.add(parity(d(i).map(([j]) => j))));
  return echelon;
}

/** Generator i of a level as an enhanced state, its circles named by their smallest labels. */
export function enhancedState(m: Movie, at: Level, i: number): EnhancedState {
  const { s, mask } = at.gens[i];
  const state = at.states[s];
  const st = at.circles[s];
  const name = (circle: number): number => m.labels[st.of.indexOf(circle)];
  const x = Array.from({ length: st.count }, (_, circle) => circle).filter((circle) => (mask >> circle) & 1).map(name);
  return { smoothing: Array.from({ length: m.n }, (_, k) => String((state >> k) & 1)).join(''), x: x.sort((p, q) => p - q) };
}
