// Laurent polynomials in two variables v and z with exact BigInt coefficients, the ring the
// HOMFLY-PT polynomial lives in. Terms are kept in a map keyed by both exponents packed into one
// number, so sums in a skein tree merge terms in O(terms).

import { Laurent, Style } from '@/shared/poly/laurent';

/** Exponents of either variable stay within +-BIAS (a diagram of n crossings needs about n). */
const BIAS = 1 << 15;
const pack = (v: number, z: number): number => {
  if (!Number.isInteger(v) || !Number.isInteger(z) || Math.abs(v) >= BIAS || Math.abs(z) >= BIAS) throw new RangeError(`exponents v^${v} z^${z} out of range`);
  return (v + BIAS) * 2 * BIAS + (z + BIAS);
};
const unpack = (key: number): [number, number] => [Math.floor(key / (2 * BIAS)) - BIAS, (key % (2 * BIAS)) - BIAS];

export class Poly2 {
  private constructor(private readonly terms: ReadonlyMap<number, bigint>) {}

  static readonly zero = new Poly2(new Map());
  static readonly one = Poly2.monomial(1n, 0, 0);

  /** c v^v z^z. */
  static monomial(c: bigint, v: number, z: number): Poly2 {
    return new Poly2(c === 0n ? new Map() : new Map([[pack(v, z), c]]));
  }

  /** From [vExp, zExp, coefficient] triples in any order; repeated exponents are summed. */
  static fromTriples(triples: Iterable<readonly [number, number, bigint | number]>): Poly2 {
    const sums = new Map<number, bigint>();
    for (const [v, z, c] of triples) add(sums, pack(v, z), BigInt(c));
    return new Poly2(sums);
  }

  isZero(): boolean {
    return this.terms.size === 0;
  }

  /** [vExp, zExp, coefficient], sorted by v then z. */
  toTriples(): [number, number, bigint][] {
    return [...this.terms].sort((a, b) => a[0] - b[0]).map(([key, c]) => [...unpack(key), c]);
  }

  add(q: Poly2): Poly2 {
    const sums = new Map(this.terms);
    for (const [key, c] of q.terms) add(sums, key, c);
    return new Poly2(sums);
  }

  /** c v^v z^z times this. */
  times(c: bigint, v: number, z: number): Poly2 {
    if (c === 0n) return Poly2.zero;
    const shift = pack(v, z) - pack(0, 0);
    return new Poly2(new Map([...this.terms].map(([key, x]) => [key + shift, x * c])));
  }

  mul(q: Poly2): Poly2 {
    const sums = new Map<number, bigint>();
    const origin = pack(0, 0);
    for (const [k1, c1] of this.terms) for (const [k2, c2] of q.terms) add(sums, k1 + k2 - origin, c1 * c2);
    return new Poly2(sums);
  }

  pow(n: number): Poly2 {
    let result: Poly2 = Poly2.one;
    for (let k = 0; k < n; k++) result = result.mul(this);
    return result;
  }

  /** Grouped by powers of z, each coefficient a Laurent polynomial in v: "2v² − v⁴ + v²z²". */
  format(style: Style = 'plain'): string {
    if (this.isZero()) return '0';
    const byZ = new Map<number, [number, bigint][]>();
    for (const [v, z, c] of this.toTriples()) byZ.set(z, [...(byZ.get(z) ?? []), [v, c]]);
    const minus = style === 'unicode' ? '−' : '-';
    return [...byZ]
      .sort((a, b) => a[0] - b[0])
      .map(([z, terms], i) => {
        const power = z === 0 ? '' : Laurent.monomial(1n, z).format('z', style);
        let text = Laurent.fromPairs(terms).format('v', style);
        if (terms.length > 1 && power !== '') text = `(${text})`;
        else if (power !== '' && (text === '1' || text === minus + '1')) text = text.slice(0, -1);
        const negative = text.startsWith(minus);
        if (i === 0) return text + power;
        return ` ${negative ? minus : '+'} ${negative ? text.slice(minus.length) : text}${power}`;
      })
      .join('');
  }

  equals(q: Poly2): boolean {
    return this.terms.size === q.terms.size && [...this.terms].every(([key, c]) => q.terms.get(key) === c);
  }
}

function add(sums: Map<number, bigint>, key: number, c: bigint): void {
  const s = (sums.get(key) ?? 0n) + c;
  if (s === 0n) sums.delete(key);
  else sums.set(key, s);
}
