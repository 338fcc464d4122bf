// Dotted cobordisms between crossingless matchings, in Bar-Natan's category with Khovanov's
// relations (sphere = 0, dotted sphere = 1, two dots = 0, neck cutting; arXiv math/0410495,
// math/0606318). Hom(P, Q) is free on one disc per cycle of P u Q, each with or without a dot,
// so a morphism is a map from dot masks (bit c = a dot on cycle c) to coefficients. Glued
// surfaces are reduced to that basis from their components' genus, dots and boundary cycles:
// a component with d dots and genus g is 0 if d + g >= 2, 2^g times all-dotted discs if
// d + g = 1, and the sum over "one disc undotted" if d = g = 0 (iterated comultiplication).

/** partner[k] = the point matched with point k. */
export type Matching = readonly number[];

export interface Cycles {
  /** Cycle of every point, cycles numbered by their smallest point. */
  readonly of: number[];
  readonly count: number;
}

/** The cycles of bottom u top, two matchings on the same points. */
export function cycles(bottom: Matching, top: Matching): Cycles {
  const of = new Array<number>(bottom.length).fill(-1);
  let count = 0;
  for (let start = 0; start < bottom.length; start++) {
    if (of[start] >= 0) continue;
    let k = start;
    do {
      of[k] = count;
      of[bottom[k]] = count;
      k = top[bottom[k]];
    } while (k !== start);
    count++;
  }
  if (count > 30) throw new RangeError(`${count} cycles exceed the 30-bit dot masks; the diagram's open boundary grew too wide`);
  return { of, count };
}

/**
 * The Frobenius algebra's rules for glued surfaces. `capDots[k]` counts the caps on piece k that
 * carry the delooping's dual dot: x when x^2 = 0 (here), x - H in the deformed theory
 * (shared/rasmussen/). Coefficients are integers; a theory with a grading variable leaves its
 * power implicit, as the grading fixes it.
 */
export interface Theory {
  reduce(pieces: readonly Piece[], dots: readonly number[], capDots?: readonly number[]): [number, number][];
}

/** Khovanov's theory: x^2 = 0, so a dual dot is a dot. */
export const khovanovTheory: Theory = {
  reduce: (pieces, dots, capDots) => reduce(pieces, capDots ? dots.map((d, k) => d + capDots[k]) : dots),
};

/** A connected glued surface: its genus and the result cycles on its boundary (a mask). */
export interface Piece {
  readonly genus: number;
  readonly boundary: number;
}

/** A glued surface given by pieces, with `dots[k]` dots on piece k, in the disc basis: [mask, coefficient]. */
export function reduce(pieces: readonly Piece[], dots: readonly number[]): [number, number][] {
  let terms: [number, number][] = [[0, 1]];
  for (let k = 0; k < pieces.length; k++) {
    const { genus, boundary } = pieces[k];
    const e = dots[k] + genus;
    if (e >= 2) return [];
    if (e === 1) {
      const factor = genus === 1 ? 2 : 1;
      terms = terms.map(([m, c]) => [m | boundary, c * factor]);
    } else {
      if (boundary === 0) return []; // an undotted sphere
      const next: [number, number][] = [];
      for (let b = boundary; b; b &= b - 1) {
        const undotted = b & -b;
        for (const [m, c] of terms) next.push([m | (boundary & ~undotted), c]);
      }
      terms = next;
    }
  }
  return terms;
}

/**
 * Union-find over discs glued along arcs. Returns the component of every disc and each
 * component's Euler characteristic (discs minus gluing arcs).
 */
export function glue(discs: number, arcs: readonly (readonly [number, number])[]): { comp: number[]; euler: number[] } {
  const parent = Array.from({ length: discs }, (_, k) => k);
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]];
    return x;
  };
  for (const [a, b] of arcs) parent[find(a)] = find(b);
  const ids = new Map<number, number>();
  const comp = parent.map((_, k) => {
    const r = find(k);
    if (!ids.has(r)) ids.set(r, ids.size);
    return ids.get(r)!;
  });
  const euler = new Array<number>(ids.size).fill(0);
  comp.forEach((c) => euler[c]++);
  for (const [a] of arcs) euler[comp[a]]--;
  return { comp, euler };
}

/** Genus from Euler characteristic and number of boundary circles. */
export function genus(euler: number, circles: number): number {
  const g = (2 - circles - euler) / 2;
  if (!Number.isInteger(g) || g < 0) throw new Error(`internal: glued surface with chi = ${euler} and ${circles} boundary circles`);
  return g;
}

/** The composite of Y: P -> Q (on cycles of P u Q) followed by X: Q -> R, precomputed for masks. */
export interface Composition {
  /** Component of each cycle of P u Q, then of each cycle of Q u R. */
  readonly compPQ: number[];
  readonly compQR: number[];
  readonly pieces: Piece[];
  /** Reduced composites already met, by (dots on P u Q) * 2^(cycles of Q u R) + dots on Q u R. */
  readonly memo: ([number, number][] | undefined)[];
}

/** The composite of the discs with dot masks m1 (on P u Q) and m2 (on Q u R), reduced. */
export function composite(c: Composition, m1: number, m2: number, theory: Theory = khovanovTheory): [number, number][] {
  const key = m1 * (1 << c.compQR.length) + m2;
  let terms = c.memo[key];
  if (!terms) {
    terms = theory.reduce(c.pieces, dotsOf(c.pieces.length, [c.compPQ, c.compQR], [m1, m2]));
    c.memo[key] = terms;
  }
  return terms;
}

export function composition(p: Matching, q: Matching, r: Matching): Composition {
  const pq = cycles(p, q);
  const qr = cycles(q, r);
  const pr = cycles(p, r);
  if (pq.count + qr.count > 52) throw new RangeError(`${pq.count + qr.count} cycles exceed the memo keys of composites; the diagram's open boundary grew too wide`);
  const arcs: [number, number][] = [];
  q.forEach((partner, k) => {
    if (k < partner) arcs.push([pq.of[k], pq.count + qr.of[k]]);
  });
  const { comp, euler } = glue(pq.count + qr.count, arcs);
  const boundary = new Array<number>(euler.length).fill(0);
  const circles = new Array<number>(euler.length).fill(0);
  const seen = new Set<number>();
  pr.of.forEach((c, k) => {
    if (seen.has(c)) return;
    seen.add(c);
    boundary[comp[pq.of[k]]] |= 1 << c;
    circles[comp[pq.of[k]]]++;
  });
  return {
    compPQ: comp.slice(0, pq.count),
    compQR: comp.slice(pq.count),
    pieces: euler.map((e, c) => ({ genus: genus(e, circles[c]), boundary: boundary[c] })),
    memo: [],
  };
}

/** Dots per component when the discs carry the dot masks `masks[k]` over the cycle sets `comps[k]`. */
export function dotsOf(pieces: number, comps: readonly (readonly number[])[], masks: readonly number[]): number[] {
  const dots = new Array<number>(pieces).fill(0);
  comps.forEach((of, k) => {
    for (let m = masks[k]; m; m &= m - 1) dots[of[31 - Math.clz32(m & -m)]]++;
  });
  return dots;
}

export function popcount(x: number): number {
  let c = 0;
  for (; x; x &= x - 1) c++;
  return c;
}
