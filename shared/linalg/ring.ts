// The coefficient rings of the homology computations: the integers, the rationals and the prime
// fields F_p. Elements of Z and Q never overflow (int.ts); F_p keeps residues in 0..p-1.

import * as Z from './int';
import { Int } from './int';

export interface Ring<T> {
  readonly name: string;
  readonly zero: T;
  readonly one: T;
  /** True when every nonzero element is a unit (Q and F_p). */
  readonly isField: boolean;
  fromInt(n: Int): T;
  add(a: T, b: T): T;
  sub(a: T, b: T): T;
  mul(a: T, b: T): T;
  neg(a: T): T;
  isZero(a: T): boolean;
  isUnit(a: T): boolean;
  /** Inverse of a unit. */
  inv(a: T): T;
  toText(a: T): string;
}

export const integers: Ring<Int> = {
  name: 'Z',
  zero: 0,
  one: 1,
  isField: false,
  fromInt: Z.norm,
  add: Z.add,
  sub: Z.sub,
  mul: Z.mul,
  neg: Z.neg,
  isZero: Z.isZero,
  isUnit: (a) => a === 1 || a === -1,
  inv: (a) => a,
  toText: Z.toText,
};

/** A rational in lowest terms with a positive denominator. */
export interface Rational {
  readonly n: Int;
  readonly d: Int;
}

function rational(n: Int, d: Int): Rational {
  if (Z.isZero(n)) return QZERO;
  const g = Z.gcd(n, d);
  const s = Z.sign(d);
  return { n: Z.divExact(s < 0 ? Z.neg(n) : n, g), d: Z.divExact(Z.abs(d), g) };
}

const QZERO: Rational = { n: 0, d: 1 };

export const rationals: Ring<Rational> = {
  name: 'Q',
  zero: QZERO,
  one: { n: 1, d: 1 },
  isField: true,
  fromInt: (n) => ({ n: Z.norm(n), d: 1 }),
  add: (a, b) => (a.d === 1 && b.d === 1 ? { n: Z.add(a.n, b.n), d: 1 } : rational(Z.add(Z.mul(a.n, b.d), Z.mul(b.n, a.d)), Z.mul(a.d, b.d))),
  sub: (a, b) => (a.d === 1 && b.d === 1 ? { n: Z.sub(a.n, b.n), d: 1 } : rational(Z.sub(Z.mul(a.n, b.d), Z.mul(b.n, a.d)), Z.mul(a.d, b.d))),
  mul: (a, b) => (a.d === 1 && b.d === 1 ? { n: Z.mul(a.n, b.n), d: 1 } : rational(Z.mul(a.n, b.n), Z.mul(a.d, b.d))),
  neg: (a) => ({ n: Z.neg(a.n), d: a.d }),
  isZero: (a) => Z.isZero(a.n),
  isUnit: (a) => !Z.isZero(a.n),
  inv: (a) => rational(a.d, a.n),
  toText: (a) => (a.d === 1 ? Z.toText(a.n) : `${Z.toText(a.n)}/${Z.toText(a.d)}`),
};

/** Largest p for which products of residues stay exact in doubles. */
export const MAX_PRIME = 94906249;

export function isPrime(p: number): boolean {
  if (!Number.isSafeInteger(p) || p < 2) return false;
  for (let d = 2; d * d <= p; d++) if (p % d === 0) return false;
  return true;
}

export function primeField(p: number): Ring<number> {
  if (!isPrime(p) || p > MAX_PRIME) throw new RangeError(`F_p needs a prime p <= ${MAX_PRIME}, got ${p}`);
  const mod = (a: number): number => {
    const r = a % p;
    return r < 0 ? r + p : r;
  };
  const inverse = (a: number): number => {
    // Extended Euclid on small numbers.
    let [r0, r1, s0, s1] = [p, a, 0, 1];
    while (r1 !== 0) {
      const q = Math.floor(r0 / r1);
      [r0, r1] = [r1, r0 - q * r1];
      [s0, s1] = [s1, s0 - q * s1];
    }
    return mod(s0);
  };
  return {
    name: `F${p}`,
    zero: 0,
    one: 1 % p,
    isField: true,
    fromInt: (n) => (typeof n === 'number' ? mod(n) : Number(((n % BigInt(p)) + BigInt(p)) % BigInt(p))),
    add: (a, b) => mod(a + b),
    sub: (a, b) => mod(a - b),
    mul: (a, b) => mod(a * b),
    neg: (a) => mod(-a),
    isZero: (a) => a === 0,
    isUnit: (a) => a !== 0,
    inv: inverse,
    toText: (a) => String(a),
  };
}
