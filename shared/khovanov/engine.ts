// Khovanov homology by Bar-Natan's local algorithm ("Fast Khovanov homology computations",
// arXiv math/0606318): crossings are added one at a time (tensor.ts), circles delooped and
// isomorphisms cancelled after each step (simplify.ts); the closed complex is then a complex
// of free modules whose homology is computed exactly (homology.ts).

import { orient, PDCode } from '../knot/pd';
import { Ring } from '../linalg/ring';
import { popcount } from './cobordism';
import { TangleComplex } from './complex';
import { Generator, homology, KhGroup } from './homology';
import { crossingOrder } from './order';
import { simplify } from './simplify';
import { addCrossing } from './tensor';

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
  /** Extra crossingless unknots (each doubles the complex: V = q + q^-1). */
  readonly unknots?: number;
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

export function fastKhovanov<T>(pd: PDCode, ring: Ring<T>, options: EngineOptions = {}): KhGroup[] {
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
    code = pd.map((x, k) => (k === head.crossing ? (x.map((l, p) => (p === head.position ? fresh : l)) as unknown as typeof x) : x));
  }

  let cx = new TangleComplex(ring, []);
  const empty = cx.matchingId([]);
  const unknots = options.unknots ?? 0;
  for (let bits = 0; bits < 1 << unknots; bits++) {
    cx.addObject({ mat: empty, shift: unknots - 2 * popcount(bits), height: 0 });
  }
  const order = crossingOrder(code);
  order.forEach((k, step) => {
    check();
    cx = addCrossing(cx, code[k]);
    simplify(cx, check);
    options.onProgress?.({ merged: step + 1, total: order.length, fraction: (step + 1) / order.length, objects: cx.live, entries: cx.entries(), boundary: cx.boundary.length });
  });

  // Closed up (or one open arc when reduced): objects are free modules of rank one; the
  // reduced quotient by x keeps the undotted coefficient.
  if (cx.boundary.length !== (options.marked === undefined ? 0 : 2)) throw new Error(`internal: ${cx.boundary.length} open ends after the last crossing`);
  const gens: Generator[] = [];
  const index = new Map<number, number>();
  cx.objs.forEach((obj, k) => {
    if (!cx.alive[k]) return;
    index.set(k, gens.length);
    gens.push({ i: obj.height - nMinus, j: obj.shift + nPlus - 2 * nMinus });
  });
  const entries: [number, number, T][] = [];
  cx.out.forEach((row, s) => {
    for (const [t, m] of row) {
      const c = m.get(0);
      if (c !== undefined) entries.push([index.get(s)!, index.get(t)!, c]);
    }
  });
  return homology(ring, gens, entries);
}

