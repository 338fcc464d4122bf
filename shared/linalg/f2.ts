// Sparse linear algebra over F2: a vector is the ascending list of the indices where it is 1.
// Row echelon form with each row's largest index as its pivot (Gaussian elimination, common
// practice). The reduction of a vector by such rows is the unique vector of its coset modulo
// their span that has no pivot index: a nonzero element of the span always has its largest
// index at a pivot. So the reduced vector is a normal form, and two vectors are congruent
// exactly when their normal forms agree.

export type F2Vector = readonly number[];

/** u + v over F2: the symmetric difference of two ascending index lists (of u's first `uLength` entries). */
export function xor(u: F2Vector, v: F2Vector, uLength = u.length): number[] {
  const out: number[] = [];
  let i = 0;
  let j = 0;
  while (i < uLength || j < v.length) {
    if (j === v.length || (i < uLength && u[i] < v[j])) out.push(u[i++]);
    else if (i === uLength || v[j] < u[i]) out.push(v[j++]);
    else {
      i++;
      j++;
    }
  }
  return out;
}

/** The ascending list of the indices occurring an odd number of times. */
export function parity(indices: Iterable<number>): number[] {
  const odd = new Set<number>();
  for (const i of indices) {
    if (odd.has(i)) odd.delete(i);
    else odd.add(i);
  }
  return [...odd].sort((p, q) => p - q);
}

export class F2Echelon {
  private readonly rows = new Map<number, F2Vector>();

  get rank(): number {
    return this.rows.size;
  }

  /** The normal form of v modulo the span of the rows. */
  reduce(v: F2Vector): number[] {
    return this.reduceTracked(v, []).vector;
  }

  /** Adds v to the span; false when it was already in it. */
  add(v: F2Vector): boolean {
    const r = this.reduce(v);
    if (r.length > 0) this.insert(r);
    return r.length > 0;
  }

  // Reduction from the top: adding the row of pivot m only changes indices below m.
  protected reduceTracked(v: F2Vector, tag: F2Vector, tags?: Map<number, F2Vector>): { vector: number[]; tag: F2Vector } {
    const kept: number[] = [];
    // The part still to reduce is w's first `end` entries.
    let w: F2Vector = v;
    let end = w.length;
    let t = tag;
    while (end > 0) {
      const m = w[end - 1];
      const row = this.rows.get(m);
      if (row) {
        w = xor(w, row, end);
        end = w.length;
        if (tags) t = xor(t, tags.get(m)!);
      } else {
        kept.push(m);
        end--;
      }
    }
    return { vector: kept.reverse(), tag: t };
  }

  protected insert(r: F2Vector): void {
    this.rows.set(r[r.length - 1], r);
  }
}

/**
 * The kernel of the map with images image(0), image(1), ... (count columns), one basis vector
 * at a time, by elimination that tracks which columns were added: column i whose image reduces
 * to zero gives the kernel vector e_i + (the columns that reduced it). Lazy, so a caller may stop
 * at the first vector it wants.
 */
export function* kernel(count: number, image: (i: number) => F2Vector): Generator<number[]> {
  const echelon = new TrackedEchelon();
  for (let i = 0; i < count; i++) {
    const k = echelon.addTracked(image(i), [i]);
    if (k) yield k;
  }
}

class TrackedEchelon extends F2Echelon {
  private readonly tags = new Map<number, F2Vector>();

  /** Adds v (with its tag); when v is in the span, returns the tag of the zero it reduced to. */
  addTracked(v: F2Vector, tag: F2Vector): number[] | undefined {
    const { vector, tag: t } = this.reduceTracked(v, tag, this.tags);
    if (vector.length === 0) return [...t];
    this.insert(vector);
    this.tags.set(vector[vector.length - 1], t);
    return undefined;
  }
}
