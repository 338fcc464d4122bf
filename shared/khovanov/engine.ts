// Khovanov homology by Bar-Natan's local algorithm ("Fast Khovanov homology computations",
// arXiv math/0606318): crossings are added one at a time (tensor.ts), circles delooped and
// isomorphisms cancelled after each step (simplify.ts); the closed complex is then a complex
// of free modules whose homology is computed exactly (homology.ts).

import { orient, PDCode, withLabelAt } from '../knot/pd';
import { Ring } from '../linalg/ring';
import { khovanovTheory, Theory } from './cobordism';
import { TangleComplex } from './complex';
import { Generator, homology, KhGroup } from './homology';
import { crossingOrder } from './order';
import { addInOrder, glueParts } from './parts';

export interface Progress {
  /** Crossings merged so far, of `total`. */
  readonly merged: number;
  readonly total: number;
  readonly fraction: number;
  /** Objects and nonzero differential entries of the current complex, and its open ends. */
  readonly objects: number;
  readonly entries: number;
  readonly boundary: number;
}

export interface EngineOptions {
  /** Reduced at this edge label: the edge is cut open and never closed. */
  readonly marked?: number;
  /** Extra crossingless unknots, tensored on at the end (withUnknots). */
  readonly unknots?: number;
  /** The order in which crossings are added (indices into the code); crossingOrder's by default. */
  readonly order?: readonly number[];
  /**
   * Instead of an order: sub-tangles (crossing indices, each part in the order it is built),
   * each built alone and then glued on in turn (parts.ts); equal parts are built once.
   */
  readonly parts?: readonly (readonly number[])[];
  readonly onProgress?: (p: Progress) => void;
  /** Checked between steps; aborting throws KhCancelled. */
  readonly signal?: { readonly aborted: boolean };
}

export class KhCancelled extends Error {
  constructor() {
    super('the Khovanov computation was cancelled');
    this.name = 'KhCancelled';
  }
}

/**
 * The complex after the last crossing, closed up (one open arc when reduced), and the crossing
 * counts that shift its gradings. Extra unknots (options.unknots) are not in it: the caller
 * tensors them on.
 */
export interface LocalComplex<T> {
  readonly cx: TangleComplex<T>;
  readonly nPlus: number;
  readonly nMinus: number;
}

/** Bar-Natan's local algorithm in a theory (Khovanov's by default); fastKhovanov reads homology off its result. */
export function localComplex<T>(pd: PDCode, ring: Ring<T>, options: EngineOptions = {}, theory: Theory = khovanovTheory): LocalComplex<T> {
  const o = orient(pd);
  const nPlus = o.signs.filter((s) => s > 0).length;
  const nMinus = pd.length - nPlus;
  const check = (): void => {
    if (options.signal?.aborted) throw new KhCancelled();
  };

  // Reduced: relabel the end of the marked edge, so that edge stays an open arc to the end.
  let code = pd;
  if (options.marked !== undefined) {
    const head = o.head.get(options.marked);
    if (!head) throw new RangeError(`edge ${options.marked} is not in the PD code`);
    const fresh = Math.max(...pd.flat()) + 1;
    code = pd.map((x, k) => (k === head.crossing ? withLabelAt(x, head.position, fresh) : x));
  }

  // The empty tangle: one object, the empty matching (Kh of the empty link is R at (0,0)).
  const empty = new TangleComplex(ring, [], theory);
  empty.addObject({ mat: empty.matchingId([]), shift: 0, height: 0 });
  let merged = 0;
  const step = (c: TangleComplex<T>, added: number): void => {
    merged += added;
    options.onProgress?.({ merged, total: pd.length, fraction: merged / pd.length, objects: c.live, entries: c.entries(), boundary: c.boundary.length });
  };
  // The order is chosen on the closed code (the reduced one has two ends), which it suits as well.
  const cx = options.parts ? glueParts(empty, code, options.parts, check, step) : addInOrder(empty, code, options.order ?? crossingOrder(pd), check, step);
  if (cx.boundary.length !== (options.marked === undefined ? 0 : 2)) throw new Error(`internal: ${cx.boundary.length} open ends after the last crossing`);
  return { cx, nPlus, nMinus };
}

export function fastKhovanov<T>(pd: PDCode, ring: Ring<T>, options: EngineOptions = {}): KhGroup[] {
  const { cx, nPlus, nMinus } = localComplex(pd, ring, options);
  // Closed up (or one open arc when reduced): objects are free modules of rank one; the
  // reduced quotient by x keeps the undotted coefficient.
  const gens: Generator[] = [];
  const index = new Map<number, number>();
  cx.objs.forEach((obj, k) => {
    if (!cx.alive[k]) return;
    index.set(k, gens.length);
    gens.push({ i: obj.height - nMinus, j: obj.shift + nPlus - 2 * nMinus });
  });
  const entries: [number, number, T][] = [];
  cx.out.forEach((row, s) => {
    row.forEach((m, t) => {
      const c = m.get(0);
      if (c !== undefined) entries.push([index.get(s)!, index.get(t)!, c]);
    });
  });
  return withUnknots(homology(ring, gens, entries), options.unknots ?? 0);
}

/**
 * Kh(L u k unknots) = Kh(L) (x) V^(x)k, V free on q^{+1} and q^{-1}: each group is repeated
 * C(k, m) times at j + k - 2m (the complex of a split diagram is a tensor product and V is free,
 * so there is no Tor term; Khovanov 2000, arXiv math/9908171, Sect. 7). RangeError when a rank
 * or the list of torsion summands would pass what a table can hold.
 */
export function withUnknots(groups: readonly KhGroup[], k: number): KhGroup[] {
  if (!Number.isSafeInteger(k) || k < 0) throw new RangeError(`the number of unknots must be a non-negative integer, got ${k}`);
  if (k === 0) return [...groups];
  const binomial = [1];
  for (let m = 1; m <= k; m++) {
    const product = binomial[m - 1] * (k - m + 1);
    if (!Number.isSafeInteger(product)) throw new RangeError(`${k} unknots: the binomial coefficients pass 2^53`);
    binomial.push(product / m);
  }
  const at = new Map<string, { i: number; j: number; free: number; torsion: number[] }>();
  for (const g of groups) {
    binomial.forEach((c, m) => {
      const i = g.i;
      const j = g.j + k - 2 * m;
      const cell = at.get(`${i},${j}`) ?? { i, j, free: 0, torsion: [] };
      at.set(`${i},${j}`, cell);
      cell.free += c * g.free;
      if (!Number.isSafeInteger(cell.free)) throw new RangeError(`${k} unknots: a rank passes 2^53`);
      if (g.torsion.length === 0) return;
      if (cell.torsion.length + c * g.torsion.length > MAX_TORSION) throw new RangeError(`${k} unknots: more than ${MAX_TORSION} torsion summands in one group`);
      for (let n = 0; n < c; n++) cell.torsion.push(...g.torsion);
    });
  }
  return [...at.values()].map((g) => ({ ...g, torsion: g.torsion.sort((a, b) => a - b) })).sort((a, b) => a.i - b.i || a.j - b.j);
}

/** Torsion summands listed one by one in a group; beyond this a table is not readable anyway. */
const MAX_TORSION = 100_000;

