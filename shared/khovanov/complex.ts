// A complex in Bar-Natan's category of a tangle: objects are crossingless matchings of the
// open boundary with a q-shift and a homological height; the differential is a sparse matrix of
// cobordisms (cobordism.ts). Bar-Natan, "Fast Khovanov homology computations", math/0606318.
// Rows and columns are plain arrays (rows are short, so indexOf beats hashing), and a
// cancellation adds its fill-in to a row through a scatter array of the row's positions, as in
// sparse Gaussian elimination: no hash lookup and no per-entry map node.

import { Ring } from '../linalg/ring';
import { Coefficients, coefficients } from './coefficients';
import { composite, composition, Composition, khovanovTheory, Matching, Theory } from './cobordism';
import { Mor } from './mor';

export interface Obj {
  /** Index into the complex's matchings. */
  readonly mat: number;
  readonly shift: number;
  /** Number of 1-smoothings so far (homological degree before the global shift). */
  readonly height: number;
}

/**
 * The nonzero components of the differential out of one object, in no order. An entry with a
 * single term (most of them) is held in the row's arrays, with no object of its own: a Mor per
 * entry was most of the heap the garbage collector walked. An entry with several terms holds a
 * Mor in `values`, and its mask is -1.
 */
export class Row<T> {
  readonly targets: number[] = [];
  readonly masks: number[] = [];
  readonly values: (T | Mor<T>)[] = [];

  get size(): number {
    return this.targets.length;
  }

  keys(): readonly number[] {
    return this.targets;
  }

  /** The terms of entry k, as (coefficient, mask). */
  terms(k: number, f: (c: T, mask: number) => void): void {
    if (this.masks[k] >= 0) f(this.values[k] as T, this.masks[k]);
    else (this.values[k] as Mor<T>).forEach(f);
  }

  /** Entry k's coefficient on the basis cobordism `mask`. */
  coefficient(k: number, mask: number): T | undefined {
    const m = this.masks[k];
    if (m >= 0) return m === mask ? (this.values[k] as T) : undefined;
    return (this.values[k] as Mor<T>).get(mask);
  }

  /** The number of terms of entry k. */
  termCount(k: number): number {
    return this.masks[k] >= 0 ? 1 : (this.values[k] as Mor<T>).size;
  }

  /** The entry to t as a Mor of its own (a copy when it has one term), or undefined: for callers off the hot path. */
  get(t: number): Mor<T> | undefined {
    const k = this.targets.indexOf(t);
    return k < 0 ? undefined : this.entry(k);
  }

  forEach(f: (m: Mor<T>, t: number) => void): void {
    for (let k = 0; k < this.targets.length; k++) f(this.entry(k), this.targets[k]);
  }

  private entry(k: number): Mor<T> {
    return this.masks[k] < 0 ? (this.values[k] as Mor<T>) : Mor.single(this.masks[k], this.values[k] as T);
  }

  push(t: number, mask: number, c: T): void {
    this.targets.push(t);
    this.masks.push(mask);
    this.values.push(c);
  }

  /** Adds c [mask] to entry k; true when the entry is now zero (the caller removes it). */
  add(k: number, mask: number, c: T, coef: Coefficients<T>, isZero: (a: T) => boolean): boolean {
    const m = this.masks[k];
    if (m === mask) {
      const v = coef.add(this.values[k] as T, c);
      this.values[k] = v;
      return isZero(v);
    }
    if (isZero(c)) return false;
    if (m < 0) return (this.values[k] as Mor<T>).add(mask, c, coef.add, isZero);
    this.masks[k] = -1;
    this.values[k] = Mor.pair(m, this.values[k] as T, mask, c);
    return false;
  }

  /** Drops entry k; the last entry takes its place. */
  removeAt(k: number): void {
    const last = this.targets.length - 1;
    this.targets[k] = this.targets[last];
    this.masks[k] = this.masks[last];
    this.values[k] = this.values[last];
    this.targets.pop();
    this.masks.pop();
    this.values.pop();
  }

  clear(): void {
    this.targets.length = 0;
    this.masks.length = 0;
    this.values.length = 0;
  }
}

/** Removes x from an unordered list that holds it once. */
function drop(list: number[], x: number): void {
  const k = list.indexOf(x);
  list[k] = list[list.length - 1];
  list.pop();
}

export class TangleComplex<T> {
  readonly matchings: Matching[] = [];
  private readonly matchingIds = new Map<string, number>();
  readonly objs: Obj[] = [];
  readonly alive: boolean[] = [];
  /** out[s] = the components of the differential from s; inn[t] = the sources of those into t. */
  readonly out: Row<T>[] = [];
  readonly inn: number[][] = [];
  /** Compositions by source matching, then target * matchings + middle. */
  private readonly compositions = new Map<number, Map<number, Composition>>();
  /** pos[t] = position of t in the row being updated, -1 elsewhere. */
  private pos = new Int32Array(0);
  private readonly coef: Coefficients<T>;
  private readonly isZero: (a: T) => boolean;
  live = 0;

  /** `boundary` lists the labels of the open ends; matchings are on their positions. */
  constructor(
    readonly ring: Ring<T>,
    readonly boundary: readonly number[],
    readonly theory: Theory = khovanovTheory,
  ) {
    this.coef = coefficients(ring);
    this.isZero = (a) => ring.isZero(a);
  }

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
    this.out.push(new Row());
    this.inn.push([]);
    this.live++;
    return this.objs.length - 1;
  }

  /** d(s -> t) += c [mask], dropping the entry when it cancels. */
  addTerm(s: number, t: number, mask: number, c: T): void {
    const row = this.out[s];
    const k = row.targets.indexOf(t);
    if (k >= 0) this.addAt(s, row, k, mask, c);
    else if (!this.ring.isZero(c)) this.create(s, row, t, mask, c);
  }

  private create(s: number, row: Row<T>, t: number, mask: number, c: T): void {
    row.push(t, mask, c);
    this.inn[t].push(s);
  }

  /** Adds c [mask] to entry k of row s; true when the entry cancelled (and entry k is now another one). */
  private addAt(s: number, row: Row<T>, k: number, mask: number, c: T): boolean {
    if (!row.add(k, mask, c, this.coef, this.isZero)) return false;
    drop(this.inn[row.targets[k]], s);
    row.removeAt(k);
    return true;
  }

  remove(x: number): void {
    const row = this.out[x];
    for (const t of row.targets) drop(this.inn[t], x);
    for (const s of this.inn[x]) this.out[s].removeAt(this.out[s].targets.indexOf(x));
    row.clear();
    this.inn[x].length = 0;
    this.alive[x] = false;
    this.live--;
  }

  private compositionOf(ma: number, mb: number, mc: number): Composition {
    const bySource = this.compositions.get(ma) ?? this.compositions.set(ma, new Map()).get(ma)!;
    const key = mc * this.matchings.length + mb;
    let comp = bySource.get(key);
    if (!comp) {
      comp = composition(this.matchings[ma], this.matchings[mb], this.matchings[mc]);
      bySource.set(key, comp);
    }
    return comp;
  }

  /** d(a -> c) += factor (y o x) for x = d(a -> skip), skip -> b an isomorphism, and every component y: b -> c of d, c other than `skip`. */
  addComposites(a: number, b: number, skip: number, factor: T): void {
    const row = this.out[a];
    if (this.pos.length < this.objs.length) this.pos = new Int32Array(2 * this.objs.length).fill(-1);
    const { pos } = this;
    for (let k = 0; k < row.targets.length; k++) pos[row.targets[k]] = k;
    // x is read before row a changes: its entry may move, a Mor of several terms stays as it is.
    const kx = pos[skip];
    const x1 = row.masks[kx];
    const x = row.values[kx];
    const ys = this.out[b];
    const ma = this.objs[a].mat;
    const mb = this.objs[b].mat;
    for (let n = 0; n < ys.targets.length; n++) {
      const c = ys.targets[n];
      if (c === skip) continue;
      const comp = this.compositionOf(ma, mb, this.objs[c].mat);
      const y1 = ys.masks[n];
      if (x1 >= 0 && y1 >= 0) this.accumulate(a, row, c, composite(comp, x1, y1, this.theory), this.coef.mul(factor, this.coef.mul(x as T, ys.values[n] as T)));
      else {
        const each = (c1: T, m1: number): void => ys.terms(n, (c2, m2) => this.accumulate(a, row, c, composite(comp, m1, m2, this.theory), this.coef.mul(factor, this.coef.mul(c1, c2))));
        if (x1 >= 0) each(x as T, x1);
        else (x as Mor<T>).forEach(each);
      }
    }
    for (let k = 0; k < row.targets.length; k++) pos[row.targets[k]] = -1;
  }

  // d(a -> c) += c12 times the reduced surface `terms`, with pos[] holding row a's positions.
  private accumulate(a: number, row: Row<T>, c: number, terms: [number, number][], c12: T): void {
    const { pos } = this;
    for (let n = 0; n < terms.length; n++) {
      const mask = terms[n][0];
      const k = terms[n][1];
      const v = k === 1 ? c12 : this.coef.mul(this.ring.fromInt(k), c12);
      const at = pos[c];
      if (at < 0) {
        if (this.ring.isZero(v)) continue;
        pos[c] = row.targets.length;
        this.create(a, row, c, mask, v);
      } else if (this.addAt(a, row, at, mask, v)) {
        pos[c] = -1;
        if (at < row.targets.length) pos[row.targets[at]] = at;
      }
    }
  }

  entries(): number {
    return this.out.reduce((n, row) => n + row.size, 0);
  }
}
