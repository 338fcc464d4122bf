// A morphism between two crossingless matchings: its coefficient on each dotted-disc basis
// cobordism, keyed by the dot mask (cobordism.ts). Most differential entries have a single
// term, so that term lives in two fields; a second term moves all terms into two short arrays,
// scanned linearly: entries have a handful of terms, where a Map per entry cost more in hashing
// and in garbage than the scan. Masks are >= 0; -1 marks the empty field.

export class Mor<T> {
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

  set(mask: number, value: T): void {
    if (this.masks) {
      const k = this.masks.indexOf(mask);
      if (k >= 0) this.values![k] = value;
      else {
        this.masks.push(mask);
        this.values!.push(value);
      }
    } else if (this.mask < 0 || this.mask === mask) {
      this.mask = mask;
      this.value = value;
    } else {
      this.masks = [this.mask, mask];
      this.values = [this.value as T, value];
      this.value = undefined;
    }
  }

  delete(mask: number): boolean {
    if (this.masks) {
      const { masks, values } = this;
      const k = masks.indexOf(mask);
      if (k < 0) return false;
      masks[k] = masks[masks.length - 1];
      values![k] = values![masks.length - 1];
      masks.pop();
      values!.pop();
      return true;
    }
    if (mask !== this.mask) return false;
    this.mask = -1;
    this.value = undefined;
    return true;
  }

  forEach(f: (value: T, mask: number) => void): void {
    if (this.masks) {
      for (let k = 0; k < this.masks.length; k++) f(this.values![k], this.masks[k]);
    } else if (this.mask >= 0) f(this.value as T, this.mask);
  }
}
