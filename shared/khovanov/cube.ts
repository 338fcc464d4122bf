// Reference computation: the full cube of resolutions with Khovanov's Frobenius algebra
// A = R[x]/(x^2) (Khovanov 2000, arXiv math/9908171) in the gradings of Bar-Natan 2002
// (arXiv math/0201043). Exponential in the crossings; used by the tests to check the engine,
// and its resolutions and edge maps by the class of a surface (shared/knot/bands/class.ts).

import { orient, PDCode } from '../knot/pd';
import { Ring } from '../linalg/ring';
import { popcount } from './cobordism';
import { Generator, homology, KhGroup } from './homology';

/**
 * Kh of a PD code by the cube. Reduced: the circle through edge `marked` is labelled x, and q
 * is shifted by +1 so that the reduced unknot is R at (0,0). The empty PD code is the unknot.
 */
export function cubeKhovanov<T>(pd: PDCode, ring: Ring<T>, marked?: number): KhGroup[] {
  const n = pd.length;
  if (n > 24) throw new RangeError(`the reference cube is for small diagrams; ${n} crossings is too many`);
  const signs = orient(pd).signs;
  const nPlus = signs.filter((s) => s > 0).length;
  const nMinus = n - nPlus;
  const labels = [...new Set(pd.flat())];
  const labelIndex = new Map(labels.map((l, k) => [l, k]));
  const at = (l: number): number => labelIndex.get(l)!;

  const states = Array.from({ length: 1 << n }, (_, s) => resolve(pd, s, labelIndex));
  const markedCircle = (s: number): number => (marked === undefined ? -1 : n === 0 ? 0 : states[s].of[labelIndex.get(marked)!]);
  // Generators of a state: masks over its circles, bit set = x. Reduced keeps the marked bit set.
  const gens: Generator[] = [];
  const offset: Map<number, number>[] = states.map((st, s) => {
    const r = popcount(s);
    const index = new Map<number, number>();
    const mc = markedCircle(s);
    for (let mask = 0; mask < 1 << st.count; mask++) {
      if (mc >= 0 && !((mask >> mc) & 1)) continue;
      const ones = popcount(mask);
      index.set(mask, gens.length);
      gens.push({ i: r - nMinus, j: st.count - 2 * ones + r + nPlus - 2 * nMinus + (mc >= 0 ? 1 : 0) });
    }
    return index;
  });

  const entries: [number, number, T][] = [];
  for (let s = 0; s < 1 << n; s++) {
    for (let k = 0; k < n; k++) {
      if ((s >> k) & 1) continue;
      const t = s | (1 << k);
      const sign = popcount(s & ((1 << k) - 1)) % 2 ? ring.neg(ring.one) : ring.one;
      for (const [mask, from] of offset[s]) {
        for (const image of edgeMap(states[s], states[t], pd[k], mask, at)) {
          const to = offset[t].get(image);
          if (to !== undefined) entries.push([from, to, sign]);
        }
      }
    }
  }
  return homology(ring, gens, entries);
}

/** The circles of one resolution: circle number of every label (by the label's index), and how many. */
export type State = { of: number[]; count: number };

/**
 * The circles of resolution `state` (bit k set: crossing k takes its 1-smoothing), labels
 * joined by the smoothing arcs; `labelIndex` numbers the labels. The empty code is one circle.
 */
export function resolve(pd: PDCode, state: number, labelIndex: ReadonlyMap<number, number>): State {
  const parent = Array.from({ length: labelIndex.size }, (_, k) => k);
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x])));
  const join = (a: number, b: number): void => void (parent[find(labelIndex.get(a)!)] = find(labelIndex.get(b)!));
  pd.forEach(([a, b, c, d], k) => {
    const one = (state >> k) & 1;
    join(a, one ? d : b);
    join(c, one ? b : d);
  });
  const ids = new Map<number, number>();
  const of = parent.map((_, k) => {
    const r = find(k);
    if (!ids.has(r)) ids.set(r, ids.size);
    return ids.get(r)!;
  });
  return { of, count: pd.length === 0 ? 1 : ids.size };
}

/**
 * The image of a generator (a mask of x-labelled circles) under the edge map that changes
 * crossing x = [a,b,c,d] from its 0-smoothing (a,b)(c,d) to its 1-smoothing (a,d)(b,c): a merge
 * m of the circles through a and c, or a split Delta into the circles through a and b. Any
 * saddle is one: pass [a, b, b] for the saddle that separates (or joins) edges a and b.
 */
export function edgeMap(from: State, to: State, [a, b, c]: readonly number[], mask: number, at: (l: number) => number): number[] {
  const ca = from.of[at(a)];
  const cc = from.of[at(c)];
  let out = 0;
  from.of.forEach((circle, k) => {
    if (circle !== ca && circle !== cc && (mask >> circle) & 1) out |= 1 << to.of[k];
  });
  const dotA = (mask >> ca) & 1;
  if (ca !== cc) {
    // Merge: 1.1 = 1, 1.x = x, x.x = 0.
    const dotC = (mask >> cc) & 1;
    if (dotA && dotC) return [];
    return [dotA || dotC ? out | (1 << to.of[at(a)]) : out];
  }
  // Split: 1 -> 1.x + x.1, x -> x.x.
  const p = 1 << to.of[at(a)];
  const q = 1 << to.of[at(b)];
  return dotA ? [out | p | q] : [out | p, out | q];
}
