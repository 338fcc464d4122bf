// Integer lattices in Z^n, sparse: a vector maps indices to nonzero integers. An echelon basis
// (each row's largest index its pivot, pivot entries positive) is built with the extended
// Euclidean algorithm on colliding pivots: the Hermite normal form without the reduction above
// the pivots (Cohen, "A Course in Computational Algebraic Number Theory", 1993, section 2.4.2).
// The rows span exactly the lattice of the vectors added. Reduction from the top brings every
// pivot entry into [0, pivot): a normal form, since a nonzero lattice vector has its largest
// index at a pivot, with a nonzero multiple of that pivot there, so two reduced vectors never
// differ by one.

import * as Z from './int';
import { Int } from './int';

export type ZVector = ReadonlyMap<number, Int>;

/** a u + b v. */
export function combine(a: Int, u: ZVector, b: Int, v: ZVector): Map<number, Int> {
  const out = new Map<number, Int>();
  for (const [i, x] of u) out.set(i, Z.mul(a, x));
  for (const [i, y] of v) {
    const s = Z.add(out.get(i) ?? 0, Z.mul(b, y));
    if (Z.isZero(s)) out.delete(i);
    else out.set(i, s);
  }
  for (const [i, x] of out) if (Z.isZero(x)) out.delete(i);
  return out;
}

const top = (v: ZVector, below: number): number => {
  let m = -1;
  for (const i of v.keys()) if (i < below && i > m) m = i;
  return m;
};

// Floor division (rem and divRound round toward zero and to nearest).
function floorDiv(a: Int, b: Int): Int {
  const q = Z.divExact(Z.sub(a, Z.rem(a, b)), b);
  return Z.sign(Z.rem(a, b)) * Z.sign(b) < 0 ? Z.sub(q, 1) : q;
}

/** [g, s, t] with s a + t b = g = gcd(a, b) >= 0 (the extended Euclidean algorithm). */
export function bezout(a: Int, b: Int): [Int, Int, Int] {
  let [r0, r1, s0, s1, t0, t1]: Int[] = [a, b, 1, 0, 0, 1];
  while (!Z.isZero(r1)) {
    const q = Z.divExact(Z.sub(r0, Z.rem(r0, r1)), r1);
    [r0, r1] = [r1, Z.sub(r0, Z.mul(q, r1))];
    [s0, s1] = [s1, Z.sub(s0, Z.mul(q, s1))];
    [t0, t1] = [t1, Z.sub(t0, Z.mul(q, t1))];
  }
  return Z.sign(r0) < 0 ? [Z.neg(r0), Z.neg(s0), Z.neg(t0)] : [r0, s0, t0];
}

interface Row {
  v: ZVector;
  /** Which added vectors the row is made of (kernel.ts tracking); empty when not tracked. */
  tag: ZVector;
}

export class ZEchelon {
  private readonly rows = new Map<number, Row>();

  get rank(): number {
    return this.rows.size;
  }

  /** The indices of the pivots (the basis states left out of the quotient's free part). */
  pivots(): number[] {
    return [...this.rows.keys()];
  }

  /** The normal form of v modulo the lattice: every pivot entry in [0, pivot). */
  reduce(v: ZVector): Map<number, Int> {
    let w = new Map(v);
    for (let m = top(w, Infinity); m >= 0; m = top(w, m)) {
      const row = this.rows.get(m);
      if (row) w = combine(1, w, Z.neg(floorDiv(w.get(m)!, row.v.get(m)!)), row.v);
    }
    return w;
  }

  /**
   * Adds v (made of `tag`) to the lattice. When v was in the span of the rows it leaves no new
   * row, and the tag of the zero it came to is returned: a relation among the added vectors.
   */
  add(v: ZVector, tag: ZVector = new Map()): Map<number, Int> | undefined {
    let w: Row = { v, tag };
    for (let m = top(w.v, Infinity); m >= 0; m = top(w.v, Infinity)) {
      const row = this.rows.get(m);
      if (!row) {
        const s = Z.sign(w.v.get(m)!);
        this.rows.set(m, { v: combine(s, w.v, 0, new Map()), tag: combine(s, w.tag, 0, new Map()) });
        return undefined;
      }
      // The unimodular step (row, w) -> (s row + t w, (w_m/g) row - (row_m/g) w) clears w at m.
      const [p, x] = [row.v.get(m)!, w.v.get(m)!];
      const [g, s, t] = bezout(p, x);
      const [a, b] = [Z.divExact(x, g), Z.neg(Z.divExact(p, g))];
      this.rows.set(m, { v: combine(s, row.v, t, w.v), tag: combine(s, row.tag, t, w.tag) });
      w = { v: combine(a, row.v, b, w.v), tag: combine(a, row.tag, b, w.tag) };
    }
    return new Map(w.tag);
  }
}

/**
 * A basis of the integer kernel of the map with images image(0), image(1), ... (count columns):
 * the relations the echelon finds, unimodular combinations of the unit vectors, so they span
 * the kernel over Z, not only over Q.
 */
export function* kernel(count: number, image: (i: number) => ZVector): Generator<Map<number, Int>> {
  const echelon = new ZEchelon();
  for (let i = 0; i < count; i++) {
    const k = echelon.add(image(i), new Map([[i, 1]]));
    if (k) yield k;
  }
}

/** The integer dot product of two vectors. */
export function dot(u: ZVector, v: ZVector): Int {
  let s: Int = 0;
  for (const [i, x] of u) {
    const y = v.get(i);
    if (y !== undefined) s = Z.add(s, Z.mul(x, y));
  }
  return s;
}
