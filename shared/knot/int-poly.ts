// Dense polynomials in Z[t] (coefficient i belongs to t^i, no trailing zeros) as a ring with
// exact division, so Bareiss elimination can run on Alexander matrices.
import type { ExactDomain } from './bareiss';

export type IntPoly = readonly bigint[];

const trim = (p: bigint[]): bigint[] => {
  while (p.length > 0 && p[p.length - 1] === 0n) p.pop();
  return p;
};

export const intPoly = (...coefficients: (bigint | number)[]): IntPoly => trim(coefficients.map(BigInt));

function combine(a: IntPoly, b: IntPoly, sign: bigint): IntPoly {
  const out = new Array<bigint>(Math.max(a.length, b.length)).fill(0n);
  a.forEach((c, i) => (out[i] += c));
  b.forEach((c, i) => (out[i] += sign * c));
  return trim(out);
}

function mul(a: IntPoly, b: IntPoly): IntPoly {
  if (a.length === 0 || b.length === 0) return [];
  const out = new Array<bigint>(a.length + b.length - 1).fill(0n);
  a.forEach((x, i) => {
    if (x !== 0n) b.forEach((y, j) => (out[i + j] += x * y));
  });
  return trim(out);
}

function divExact(a: IntPoly, b: IntPoly): IntPoly {
  if (b.length === 0) throw new RangeError('division by the zero polynomial');
  const rest = [...a];
  const lead = b[b.length - 1];
  const quotient = new Array<bigint>(Math.max(0, a.length - b.length + 1)).fill(0n);
  for (let i = quotient.length - 1; i >= 0; i--) {
    const top = rest[i + b.length - 1];
    if (top % lead !== 0n) throw new RangeError('polynomial division is not exact');
    const q = top / lead;
    quotient[i] = q;
    if (q !== 0n) b.forEach((c, j) => (rest[i + j] -= q * c));
  }
  if (rest.some((c) => c !== 0n)) throw new RangeError('polynomial division is not exact');
  return trim(quotient);
}

export const polynomials: ExactDomain<IntPoly> = {
  zero: [],
  one: [1n],
  isZero: (a) => a.length === 0,
  mul,
  sub: (a, b) => combine(a, b, -1n),
  neg: (a) => a.map((c) => -c),
  divExact,
};

export const addPoly = (a: IntPoly, b: IntPoly): IntPoly => combine(a, b, 1n);
