// A morphism between two crossingless matchings: its coefficient on each dotted-disc basis
// cobordism, keyed by the dot mask (cobordism.ts). A row of the differential keeps an entry with
// several terms as a Mor, its terms in two short arrays scanned linearly (entries have a handful
// of terms; a Map per entry cost more in hashing and garbage than the scan); a single term is
// kept in the row itself (complex.ts) and becomes a Mor in two fields only for readers off the
// hot path. Masks are >= 0; -1 marks the empty field.

export class Mor<T> {
  /** The morphism with the one term c [mask]. */
  static single<T>(mask: number, c: T): Mor<T> {
    const m = new Mor<T>();
    m.mask = mask;
    m.value = c;
    return m;
  }

  /** The morphism c1 [m1] + c2 [m2], m1 != m2. */
  static pair<T>(m1: number, c1: T, m2: number, c2: T): Mor<T> {
    const m = new Mor<T>();
    m.masks = [m1, m2];
    m.values = [c1, c2];
    return m;
  }

  private mask = -1;
  private value: T | undefined = undefined;
  /** Every term's mask and coefficient, once the entry has had two terms. */
  private masks: number[] | undefined = undefined;
  private values: T[] | undefined = undefined;

  get size(): number {
    if (this.masks) return this.masks.length;
    return this.mask < 0 ? 0 : 1;
  }

  /** The mask of the only term, or -1 when there are several (or none): lets hot loops skip forEach's closure. */
  get single(): number {
    return this.masks ? -1 : this.mask;
  }

  /** The coefficient of the only term (when `single` >= 0). */
  get singleValue(): T {
    return this.value as T;
  }

  get(mask: number): T | undefined {
    if (this.masks) {
      const k = this.masks.indexOf(mask);
      return k < 0 ? undefined : this.values![k];
    }
    return mask === this.mask ? this.value : undefined;
  }

  /** Adds c (nonzero) to the coefficient of `mask` of an entry that has had two terms, dropping a term that cancels; true when none is left. */
  add(mask: number, c: T, plus: (a: T, b: T) => T, isZero: (a: T) => boolean): boolean {
    const masks = this.masks!;
    const values = this.values!;
    const k = masks.indexOf(mask);
    if (k < 0) {
      masks.push(mask);
      values.push(c);
      return false;
    }
    const v = plus(values[k], c);
    if (!isZero(v)) {
      values[k] = v;
      return false;
    }
    masks[k] = masks[masks.length - 1];
    values[k] = values[masks.length - 1];
    masks.pop();
    values.pop();
    return masks.length === 0;
  }

  forEach(f: (value: T, mask: number) => void): void {
    if (this.masks) {
      for (let k = 0; k < this.masks.length; k++) f(this.values![k], this.masks[k]);
    } else if (this.mask >= 0) f(this.value as T, this.mask);
  }
}
