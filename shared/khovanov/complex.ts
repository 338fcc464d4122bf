// A complex in Bar-Natan's category of a tangle: objects are crossingless matchings of the
// open boundary with a q-shift and a homological height; the differential is a sparse matrix of
// cobordisms (cobordism.ts). Bar-Natan, "Fast Khovanov homology computations", math/0606318.

import { Ring } from '../linalg/ring';
import { composite, composition, Composition, khovanovTheory, Matching, Theory } from './cobordism';
import { Mor } from './mor';

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
  /** Compositions by source matching, then target * matchings + middle. */
  private readonly compositions = new Map<number, Map<number, Composition>>();
  live = 0;

  /** `boundary` lists the labels of the open ends; matchings are on their positions. */
  constructor(
    readonly ring: Ring<T>,
    readonly boundary: readonly number[],
    readonly theory: Theory = khovanovTheory,
  ) {}

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

  /** d(s -> t) += c [mask], dropping the entry when it cancels. */
  addTerm(s: number, t: number, mask: number, c: T): void {
    const { ring } = this;
    const row = this.out[s];
    let current = row.get(t);
    if (!current) {
      if (ring.isZero(c)) return;
      current = new Mor<T>();
      row.set(t, current);
      this.inn[t].add(s);
    }
    const v = ring.add(current.get(mask) ?? ring.zero, c);
    if (!ring.isZero(v)) current.set(mask, v);
    else if (current.delete(mask) && current.size === 0) {
      row.delete(t);
      this.inn[t].delete(s);
    }
  }

  remove(x: number): void {
    for (const t of this.out[x].keys()) this.inn[t].delete(x);
    for (const s of this.inn[x]) this.out[s].delete(x);
    this.out[x].clear();
    this.inn[x].clear();
    this.alive[x] = false;
    this.live--;
  }

  /** d(a -> c) += factor (y o x) for x: a -> b and y: b -> c. */
  addComposite(a: number, b: number, c: number, x: Mor<T>, y: Mor<T>, factor: T): void {
    const ma = this.objs[a].mat;
    const mb = this.objs[b].mat;
    const mc = this.objs[c].mat;
    const bySource = this.compositions.get(ma) ?? this.compositions.set(ma, new Map()).get(ma)!;
    const key = mc * this.matchings.length + mb;
    let comp = bySource.get(key);
    if (!comp) {
      comp = composition(this.matchings[ma], this.matchings[mb], this.matchings[mc]);
      bySource.set(key, comp);
    }
    const { ring } = this;
    // forEach rather than for-of: no [key, value] pair is allocated per entry.
    x.forEach((c1, m1) => {
      y.forEach((c2, m2) => {
        const c12 = ring.mul(factor, ring.mul(c1, c2));
        const terms = composite(comp!, m1, m2, this.theory);
        for (let n = 0; n < terms.length; n++) {
          const [mask, k] = terms[n];
          this.addTerm(a, c, mask, k === 1 ? c12 : ring.mul(ring.fromInt(k), c12));
        }
      });
    });
  }

  entries(): number {
    return this.out.reduce((n, row) => n + row.size, 0);
  }
}
