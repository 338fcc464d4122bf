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
  reduce: (pieces, dots, capDots) => reduce(pieces, dots, capDots),
};

/** A connected glued surface: its genus and the result cycles on its boundary (a mask). */
export interface Piece {
  readonly genus: number;
  readonly boundary: number;
}

/** The reduced surface that is zero. */
const NONE: [number, number][] = [];

// Most reduced surfaces are one term, and every memo keeps its results for the life of a
// complex: shared lists, one per (mask, handles), keep the memos from filling the young
// generation with survivors that each scavenge copies (never mutated: callers only read them).
// Masks up to 16 circles are shared, so the table, which outlives every run, stays bounded.
const singles = new Map<number, [number, number][]>();

function single(mask: number, handles: number): [number, number][] {
  if (mask >= 1 << 16) return [[mask, 2 ** handles]];
  const key = mask * 32 + handles;
  let terms = singles.get(key);
  if (!terms) singles.set(key, (terms = [[mask, 2 ** handles]]));
  return terms;
}

/**
 * A glued surface given by pieces, with `dots[k]` (plus `capDots[k]`) dots on piece k, in the
 * disc basis: [mask, coefficient]. Every term has the same coefficient (2^handles of the
 * once-dotted pieces), and the terms are the choices of one undotted circle on each undotted
 * piece, so the list is built at its final size: this runs on every memo miss, and the
 * intermediate lists of a piece-by-piece product were the engine's largest allocation.
 */
export function reduce(pieces: readonly Piece[], dots: readonly number[], capDots?: readonly number[]): [number, number][] {
  let dotted = 0;
  let handles = 0;
  let count = 1;
  for (let k = 0; k < pieces.length; k++) {
    const { genus, boundary } = pieces[k];
    const e = dots[k] + (capDots ? capDots[k] : 0) + genus;
    if (e >= 2) return NONE;
    if (e === 1) {
      dotted |= boundary;
      handles += genus;
    } else if (boundary === 0) return NONE; // an undotted sphere
    else count *= popcount(boundary);
  }
  if (count === 1) return single(dotted, handles);
  const factor = 2 ** handles;
  const terms: [number, number][] = [[dotted, factor]];
  for (let k = 0; k < pieces.length; k++) {
    const { genus, boundary } = pieces[k];
    if (dots[k] + (capDots ? capDots[k] : 0) + genus !== 0) continue;
    const n = terms.length;
    const first = boundary & -boundary;
    for (let b = boundary & (boundary - 1); b; b &= b - 1) {
      const others = boundary & ~(b & -b);
      for (let t = 0; t < n; t++) terms.push([terms[t][0] | others, factor]);
    }
    for (let t = 0; t < n; t++) terms[t][0] |= boundary & ~first;
  }
  return terms;
}

// Union-find scratch: glue runs on every memo miss of a gluing or a composite.
let parent = new Int32Array(64);
let idOf = new Int32Array(64);

function root(x: number): number {
  while (parent[x] !== x) x = parent[x] = parent[parent[x]];
  return x;
}

/**
 * Union-find over discs glued along arcs, given flat as [a0, b0, a1, b1, ...]. Returns the
 * component of every disc (numbered by first disc) and each component's Euler characteristic
 * (discs minus gluing arcs).
 */
export function glue(discs: number, arcs: readonly number[]): { comp: number[]; euler: number[] } {
  if (parent.length < discs) {
    parent = new Int32Array(2 * discs);
    idOf = new Int32Array(2 * discs);
  }
  for (let k = 0; k < discs; k++) {
    parent[k] = k;
    idOf[k] = -1;
  }
  for (let a = 0; a < arcs.length; a += 2) parent[root(arcs[a])] = root(arcs[a + 1]);
  const comp = new Array<number>(discs);
  let ids = 0;
  for (let k = 0; k < discs; k++) {
    const r = root(k);
    if (idOf[r] < 0) idOf[r] = ids++;
    comp[k] = idOf[r];
  }
  const euler = new Array<number>(ids).fill(0);
  for (let k = 0; k < discs; k++) euler[comp[k]]++;
  for (let a = 0; a < arcs.length; a += 2) euler[comp[arcs[a]]]--;
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
    const dots = discDots(c.pieces.length, c.compPQ, m1);
    for (let m = m2; m; m &= m - 1) dots[c.compQR[31 - Math.clz32(m & -m)]]++;
    terms = theory.reduce(c.pieces, dots);
    c.memo[key] = terms;
  }
  return terms;
}

export function composition(p: Matching, q: Matching, r: Matching): Composition {
  const pq = cycles(p, q);
  const qr = cycles(q, r);
  const pr = cycles(p, r);
  if (pq.count + qr.count > 52) throw new RangeError(`${pq.count + qr.count} cycles exceed the memo keys of composites; the diagram's open boundary grew too wide`);
  const arcs: number[] = [];
  for (let k = 0; k < q.length; k++) if (k < q[k]) arcs.push(pq.of[k], pq.count + qr.of[k]);
  const { comp, euler } = glue(pq.count + qr.count, arcs);
  const boundary = new Array<number>(euler.length).fill(0);
  const circles = new Array<number>(euler.length).fill(0);
  // Cycles are numbered by their smallest point, so cycle c is met first where of[k] = c is new.
  for (let k = 0, next = 0; k < pr.of.length; k++) {
    const c = pr.of[k];
    if (c !== next) continue;
    next++;
    boundary[comp[pq.of[k]]] |= 1 << c;
    circles[comp[pq.of[k]]]++;
  }
  return {
    compPQ: comp.slice(0, pq.count),
    compQR: comp.slice(pq.count),
    pieces: euler.map((e, c) => ({ genus: genus(e, circles[c]), boundary: boundary[c] })),
    memo: [],
  };
}

const dotScratch: number[] = [];

/**
 * Dots per piece when the discs carry the dot mask `mask`, `of` giving each disc's piece. The
 * array is scratch, overwritten by the next call: reduce reads it and keeps nothing.
 */
export function discDots(pieces: number, of: readonly number[], mask: number): number[] {
  for (let k = 0; k < pieces; k++) dotScratch[k] = 0;
  for (let m = mask; m; m &= m - 1) dotScratch[of[31 - Math.clz32(m & -m)]]++;
  return dotScratch;
}

export function popcount(x: number): number {
  let c = 0;
  for (; x; x &= x - 1) c++;
  return c;
}
