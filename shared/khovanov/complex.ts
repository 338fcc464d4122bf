// A complex in Bar-Natan's category of a tangle: objects are crossingless matchings of the
// open boundary with a q-shift and a homological height; the differential is a sparse matrix of
// cobordisms (cobordism.ts). Bar-Natan, "Fast Khovanov homology computations", math/0606318.

import { Ring } from '../linalg/ring';
import { composition, Composition, dotsOf, Matching, Mor, reduce } from './cobordism';

export interface Obj {
  /** Index into the complex's matchings. */
  readonly mat: number;
  readonly shift: number;
  /** Number of 1-smoothings so far (homological degree before the global shift). */
  readonly height: number;
}

export class TangleComplex<T> {
  readonly matchings: Matching[] = [];
  private readonly matchingIds = new Map<string, number>();
  readonly objs: Obj[] = [];
  readonly alive: boolean[] = [];
  /** out[s].get(t) = the component of the differential from s to t. */
  readonly out: Map<number, Mor<T>>[] = [];
  readonly inn: Set<number>[] = [];
  private readonly compositions = new Map<string, Composition>();
  live = 0;

  /** `boundary` lists the labels of the open ends; matchings are on their positions. */
  constructor(readonly ring: Ring<T>, readonly boundary: readonly number[]) {}

  matchingId(m: Matching): number {
    const key = m.join(',');
    let id = this.matchingIds.get(key);
    if (id === undefined) {
      id = this.matchings.length;
      this.matchings.push(m);
      this.matchingIds.set(key, id);
    }
    return id;
  }

  addObject(o: Obj): number {
    this.objs.push(o);
    this.alive.push(true);
    this.out.push(new Map());
    this.inn.push(new Set());
    this.live++;
    return this.objs.length - 1;
  }

  /** d(s -> t) += sign * m, dropping the entry when it cancels. */
  addTo(s: number, t: number, m: Mor<T>, sign: T): void {
    const row = this.out[s];
    const current = row.get(t) ?? new Map<number, T>();
    const { ring } = this;
    for (const [mask, c] of m) {
      const v = ring.add(current.get(mask) ?? ring.zero, ring.mul(sign, c));
      if (ring.isZero(v)) current.delete(mask);
      else current.set(mask, v);
    }
    if (current.size > 0) {
      row.set(t, current);
      this.inn[t].add(s);
    } else {
      row.delete(t);
      this.inn[t].delete(s);
    }
  }

  remove(x: number): void {
    for (const t of this.out[x].keys()) this.inn[t].delete(x);
    for (const s of this.inn[x]) this.out[s].delete(x);
    this.out[x] = new Map();
    this.inn[x] = new Set();
    this.alive[x] = false;
    this.live--;
  }

  /** y o x for x: a -> b and y: b -> c. */
  compose(a: number, b: number, c: number, x: Mor<T>, y: Mor<T>): Mor<T> {
    const [ma, mb, mc] = [this.objs[a].mat, this.objs[b].mat, this.objs[c].mat];
    const key = `${ma},${mb},${mc}`;
    let comp = this.compositions.get(key);
    if (!comp) {
      comp = composition(this.matchings[ma], this.matchings[mb], this.matchings[mc]);
      this.compositions.set(key, comp);
    }
    const { ring } = this;
    const result: Mor<T> = new Map();
    for (const [m1, c1] of x) {
      for (const [m2, c2] of y) {
        const c12 = ring.mul(c1, c2);
        for (const [mask, k] of reduce(comp.pieces, dotsOf(comp.pieces.length, [comp.compPQ, comp.compQR], [m1, m2]))) {
          const v = ring.add(result.get(mask) ?? ring.zero, k === 1 ? c12 : ring.mul(ring.fromInt(k), c12));
          if (ring.isZero(v)) result.delete(mask);
          else result.set(mask, v);
        }
      }
    }
    return result;
  }

  entries(): number {
    return this.out.reduce((n, row) => n + row.size, 0);
  }
}
