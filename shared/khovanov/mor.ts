// A morphism between two crossingless matchings: its coefficient on each dotted-disc basis
// cobordism, keyed by the dot mask (cobordism.ts). Most differential entries have a single
// term, so that term lives in two fields and a Map is made only for a second one: a Map per
// entry was most of the engine's garbage. Masks are >= 0; -1 marks the empty field.

export class Mor<T> {
  private mask = -1;
  private value: T | undefined = undefined;
  private map: Map<number, T> | undefined = undefined;

  get size(): number {
    if (this.map) return this.map.size;
    return this.mask < 0 ? 0 : 1;
  }

  /** The mask of the only term, or -1 when there are several (or none): lets hot loops skip forEach's closure. */
  get single(): number {
    return this.map ? -1 : this.mask;
  }

  /** The coefficient of the only term (when `single` >= 0). */
  get singleValue(): T {
    return this.value as T;
  }

  get(mask: number): T | undefined {
    if (this.map) return this.map.get(mask);
    return mask === this.mask ? this.value : undefined;
  }

  set(mask: number, value: T): void {
    if (this.map) this.map.set(mask, value);
    else if (this.mask < 0 || this.mask === mask) {
      this.mask = mask;
      this.value = value;
    } else this.map = new Map([[this.mask, this.value as T], [mask, value]]);
  }

  delete(mask: number): boolean {
    if (this.map) return this.map.delete(mask);
    if (mask !== this.mask) return false;
    this.mask = -1;
    this.value = undefined;
    return true;
  }

  forEach(f: (value: T, mask: number) => void): void {
    if (this.map) this.map.forEach(f);
    else if (this.mask >= 0) f(this.value as T, this.mask);
  }
}
