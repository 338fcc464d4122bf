// The engine's coefficient fast paths (shared/khovanov/coefficients.ts) against the rings they
// shortcut: every sum and product must be the ring's own, also where intermediates pass 2^53
// and the ring has to take over with BigInt (exact arithmetic; common practice).

import { coefficients } from '@/shared/khovanov/coefficients';
import { integers, Rational, rationals } from '@/shared/linalg/ring';
import { seededRng } from '@/shared/knot/moves/random';

const text = (a: Rational): string => rationals.toText(a);

describe('coefficient fast paths = the ring', () => {
  const rnd = seededRng(7);
  // Small values, values near 2^53 and BigInts, so every branch is taken.
  const ints = (): (number | bigint)[] => [0, 1, -1, 2, -3, 7, 94906249, -(2 ** 52) + 5, 2 ** 53 - 1, -(2 ** 53 - 1), 2n ** 60n, -(3n ** 40n)];
  const pick = <X>(xs: X[]): X => xs[Math.floor(rnd() * xs.length)];

  it('over Z', () => {
    const z = coefficients(integers);
    for (let n = 0; n < 2000; n++) {
      const a = integers.fromInt(pick(ints()));
      const b = integers.fromInt(pick(ints()));
      expect(z.add(a, b)).toBe(integers.add(a, b));
      expect(z.mul(a, b)).toBe(integers.mul(a, b));
    }
  });

  it('over Q, with fractions of small and of huge parts', () => {
    const q = coefficients(rationals);
    const value = (): Rational => {
      const d = pick([1, 1, 2, 3, 6, 2 ** 40, 2n ** 70n]);
      const n = pick(ints());
      return n === 0 ? 0 : rationals.mul(rationals.fromInt(n), rationals.inv(rationals.fromInt(d)));
    };
    for (let n = 0; n < 2000; n++) {
      const a = value();
      const b = value();
      expect(text(q.add(a, b))).toBe(text(rationals.add(a, b)));
      expect(text(q.mul(a, b))).toBe(text(rationals.mul(a, b)));
      // The canonical form too: an integer result is a plain number or bigint, never n/1.
      expect(typeof q.add(a, b)).toBe(typeof rationals.add(a, b));
    }
  });
});
