// Sums and products of differential coefficients. Over Z and Q almost every coefficient is an
// integer or a fraction of small integers held as plain numbers; combining those directly, and
// falling back to the ring only when an intermediate is not a safe integer (then exactness
// needs BigInt), skips the ring's type dispatch and BigInt checks on the engine's hottest path.

import { Fraction, integers, Rational, rationals, Ring } from '../linalg/ring';

export interface Coefficients<T> {
  add(a: T, b: T): T;
  mul(a: T, b: T): T;
}

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

/** n/d in lowest terms (d > 0, both safe), as the ring holds it: an integer when d divides n. */
function lowest(n: number, d: number): Rational {
  if (n === 0) return 0;
  const g = gcd(Math.abs(n), d);
  return g === d ? n / g : { n: n / g, d: d / g };
}

const safe = Number.isSafeInteger;

export function coefficients<T>(ring: Ring<T>): Coefficients<T> {
  if ((ring as Ring<unknown>) === integers) return integerCoefficients(ring);
  if ((ring as Ring<unknown>) === rationals) return rationalCoefficients(ring);
  return ring;
}

function integerCoefficients<T>(ring: Ring<T>): Coefficients<T> {
  return {
    add: (a, b) => {
      if (typeof a === 'number' && typeof b === 'number') {
        const r = a + b;
        if (safe(r)) return r as T;
      }
      return ring.add(a, b);
    },
    mul: (a, b) => {
      if (typeof a === 'number' && typeof b === 'number') {
        const r = a * b;
        // An unsafe exact product rounds to an unsafe double, so this test is exact; 0 drops -0.
        if (safe(r)) return (r === 0 ? 0 : r) as T;
      }
      return ring.mul(a, b);
    },
  };
}

// Numerator and denominator of a rational; either may be a bigint, which smallOp checks.
const num = (a: unknown): unknown => (typeof a === 'object' ? (a as Fraction).n : a);
const den = (a: unknown): unknown => (typeof a === 'object' ? (a as Fraction).d : 1);

/** op on the parts of a and b when all four are numbers (op gives undefined when unsafe), else undefined. */
function smallOp(a: unknown, b: unknown, op: (na: number, da: number, nb: number, db: number) => Rational | undefined): Rational | undefined {
  const na = num(a);
  const da = den(a);
  const nb = num(b);
  const db = den(b);
  return typeof na === 'number' && typeof da === 'number' && typeof nb === 'number' && typeof db === 'number' ? op(na, da, nb, db) : undefined;
}

function sum(na: number, da: number, nb: number, db: number): Rational | undefined {
  const p = na * db;
  const q = nb * da;
  const d = da * db;
  return safe(p) && safe(q) && safe(p + q) && safe(d) ? lowest(p + q, d) : undefined;
}

function product(na: number, da: number, nb: number, db: number): Rational | undefined {
  const n = na * nb;
  const d = da * db;
  return safe(n) && safe(d) ? lowest(n, d) : undefined;
}

function rationalCoefficients<T>(ring: Ring<T>): Coefficients<T> {
  const z = integerCoefficients(ring);
  return {
    add: (a, b) => (typeof a === 'number' && typeof b === 'number' ? z.add(a, b) : ((smallOp(a, b, sum) as T | undefined) ?? ring.add(a, b))),
    mul: (a, b) => (typeof a === 'number' && typeof b === 'number' ? z.mul(a, b) : ((smallOp(a, b, product) as T | undefined) ?? ring.mul(a, b))),
  };
}
