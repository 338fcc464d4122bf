// Exact integers that stay JS numbers while they are safe (|x| < 2^53) and become BigInt beyond,
// so arithmetic never wraps or rounds. Every function returns the number form when it fits.

export type Int = number | bigint;

const MAX = BigInt(Number.MAX_SAFE_INTEGER);

/** The canonical form: a number when safe, otherwise a bigint. */
export function norm(x: Int): Int {
  if (typeof x === 'number') {
    if (!Number.isSafeInteger(x)) throw new RangeError(`${x} is not a safe integer`);
    return x;
  }
  return x <= MAX && x >= -MAX ? Number(x) : x;
}

const big = (x: Int): bigint => (typeof x === 'bigint' ? x : BigInt(x));

export function add(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') {
    const r = a + b;
    if (Number.isSafeInteger(r)) return r;
  }
  return norm(big(a) + big(b));
}

export function sub(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') {
    const r = a - b;
    if (Number.isSafeInteger(r)) return r;
  }
  return norm(big(a) - big(b));
}

export function mul(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') {
    const r = a * b;
    // A product whose exact value is unsafe rounds to an unsafe double, so this test is exact.
    if (Number.isSafeInteger(r)) return r === 0 ? 0 : r;
  }
  return norm(big(a) * big(b));
}

export function neg(a: Int): Int {
  return typeof a === 'number' ? (a === 0 ? 0 : -a) : norm(-a);
}

export function isZero(a: Int): boolean {
  return a === 0 || a === 0n;
}

export function abs(a: Int): Int {
  return typeof a === 'number' ? Math.abs(a) : a < 0n ? -a : a;
}

export function sign(a: Int): number {
  return typeof a === 'number' ? Math.sign(a) : a > 0n ? 1 : a < 0n ? -1 : 0;
}

export function cmpAbs(a: Int, b: Int): number {
  const x = abs(a);
  const y = abs(b);
  if (typeof x === 'number' && typeof y === 'number') return x - y;
  const d = big(x) - big(y);
  return d > 0n ? 1 : d < 0n ? -1 : 0;
}

/** Quotient rounded to the nearest integer (ties toward zero), so remainders stay small. */
export function divRound(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') {
    const q = Math.trunc(a / b);
    const r = a - q * b;
    if (2 * Math.abs(r) > Math.abs(b)) return Math.sign(r) === Math.sign(b) ? q + 1 : q - 1;
    return q;
  }
  const A = big(a);
  const B = big(b);
  let q = A / B;
  const r = A - q * B;
  const r2 = (r < 0n ? -r : r) * 2n;
  if (r2 > (B < 0n ? -B : B)) q += (r < 0n) === (B < 0n) ? 1n : -1n;
  return norm(q);
}

/** Exact division; the caller knows b divides a. */
export function divExact(a: Int, b: Int): Int {
  if (typeof a === 'number' && typeof b === 'number') return a / b;
  return norm(big(a) / big(b));
}

/** Remainder with the sign of a (as % does). */
export function rem(a: Int, b: Int): Int {
  return typeof a === 'number' && typeof b === 'number' ? a % b || 0 : norm(big(a) % big(b));
}

export function gcd(a: Int, b: Int): Int {
  let x = abs(a);
  let y = abs(b);
  while (!isZero(y)) {
    const r = rem(x, y);
    x = y;
    y = r;
  }
  return x;
}

export function toText(a: Int): string {
  return a.toString();
}
