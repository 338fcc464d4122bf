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

/** A non-integral rational in lowest terms with a denominator > 1. */
export interface Fraction {
  readonly n: Int;
  readonly d: Int;
}

/** An element of Q: an integer as such (no allocation on the common path), otherwise a fraction. */
export type Rational = Int | Fraction;

const num = (a: Rational): Int => (typeof a === 'object' ? a.n : a);
const den = (a: Rational): Int => (typeof a === 'object' ? a.d : 1);

function rational(n: Int, d: Int): Rational {
  if (Z.isZero(n)) return 0;
  const g = Z.gcd(n, d);
  const s = Z.sign(d);
  const n1 = Z.divExact(s < 0 ? Z.neg(n) : n, g);
  const d1 = Z.divExact(Z.abs(d), g);
  return d1 === 1 ? n1 : { n: n1, d: d1 };
}

export const rationals: Ring<Rational> = {
  name: 'Q',
  zero: 0,
  one: 1,
  isField: true,
  fromInt: Z.norm,
  add: (a, b) => (typeof a !== 'object' && typeof b !== 'object' ? Z.add(a, b) : rational(Z.add(Z.mul(num(a), den(b)), Z.mul(num(b), den(a))), Z.mul(den(a), den(b)))),
  sub: (a, b) => (typeof a !== 'object' && typeof b !== 'object' ? Z.sub(a, b) : rational(Z.sub(Z.mul(num(a), den(b)), Z.mul(num(b), den(a))), Z.mul(den(a), den(b)))),
  mul: (a, b) => (typeof a !== 'object' && typeof b !== 'object' ? Z.mul(a, b) : rational(Z.mul(num(a), num(b)), Z.mul(den(a), den(b)))),
  neg: (a) => (typeof a === 'object' ? { n: Z.neg(a.n), d: a.d } : Z.neg(a)),
  isZero: (a) => a === 0,
  isUnit: (a) => a !== 0,
  inv: (a) => rational(den(a), num(a)),
  toText: (a) => (typeof a === 'object' ? `${Z.toText(a.n)}/${Z.toText(a.d)}` : Z.toText(a)),
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
