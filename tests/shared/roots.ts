// Exact values of a Laurent polynomial at roots of unity, for identities the tests check.
import { Laurent } from '@/shared/poly/laurent';

const mod = (e: number, m: number) => ((e % m) + m) % m;

/** V at t = omega = e^(2 pi i/3), integer exponents: [x, y] meaning x + y omega (omega^2 = -1 - omega). */
export function atOmega(v: Laurent): [bigint, bigint] {
  let x = 0n;
  let y = 0n;
  for (const [e, c] of v.toPairs()) {
    if (!Number.isInteger(e)) throw new RangeError('integer exponents only');
    const r = mod(e, 3);
    if (r === 0) x += c;
    else if (r === 1) y += c;
    else [x, y] = [x - c, y - c];
  }
  return [x, y];
}

/** V at t^(1/2) = i, exponents integers or halves: [re, im]; |V(-1)| is the determinant. */
export function atMinusOne(v: Laurent): [bigint, bigint] {
  let re = 0n;
  let im = 0n;
  for (const [e, c] of v.toPairs()) {
    const r = mod(2 * e, 4); // i^(2e)
    if (r === 0) re += c;
    else if (r === 1) im += c;
    else if (r === 2) re -= c;
    else im -= c;
  }
  return [re, im];
}

/** |V(-1)| as an integer (re or im is zero for links, by the parity of the exponents). */
export const determinantOf = (v: Laurent): bigint => {
  const [re, im] = atMinusOne(v);
  const abs = (x: bigint) => (x < 0n ? -x : x);
  return abs(re) + abs(im);
};
