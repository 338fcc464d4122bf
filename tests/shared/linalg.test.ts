// Integer linear algebra behind the Khovanov engine: exact integers that switch to BigInt at
// 2^53, the rings Z, Q, F_p, ranks and the Smith normal form. Values are elementary arithmetic
// ("from memory"); the Smith form facts are from Newman, Integral Matrices (1972), ch. II.

import * as Z from '@/shared/linalg/int';
import { primeField, rationals } from '@/shared/linalg/ring';
import { rank } from '@/shared/linalg/eliminate';
import { primePowers, smith } from '@/shared/linalg/smith';
import { sparse } from '@/shared/linalg/sparse';
import { seededRng } from '@/shared/knot/moves/random';

const MAX = Number.MAX_SAFE_INTEGER; // 2^53 - 1

const dense = (rows: (number | bigint)[][]) =>
  sparse(rows.length, rows[0]?.length ?? 0, rows.flatMap((r, i) => r.map((v, j) => [i, j, Z.norm(v)] as const)), Z.add, Z.isZero);

describe('safe integers with a BigInt switch', () => {
  it('stays a number below 2^53 and becomes an exact bigint above', () => {
    expect(Z.add(MAX - 1, 1)).toBe(MAX);
    expect(Z.add(MAX, 1)).toBe(2n ** 53n);
    expect(Z.sub(-MAX, 2)).toBe(-(2n ** 53n) - 1n);
    expect(Z.mul(2 ** 30, 2 ** 30)).toBe(2n ** 60n);
    expect(Z.mul(3 ** 20, 3 ** 20)).toBe(3n ** 40n); // 3^40 ~ 1.2e19: a rounded double would be wrong
  });

  it('returns to numbers when a bigint result is small again', () => {
    const big = Z.mul(2 ** 40, 2 ** 20);
    expect(typeof big).toBe('bigint');
    expect(Z.divExact(big, 2 ** 20)).toBe(2 ** 40);
    expect(Z.sub(big, big)).toBe(0);
    expect(Z.gcd(Z.mul(3, 2 ** 60), 7 * 2 ** 10)).toBe(2 ** 10);
    expect(Z.gcd(Z.mul(6, 2 ** 60), Z.mul(4, 2 ** 60))).toBe(2n ** 61n);
  });

  it('rounds quotients to the nearest integer for both representations', () => {
    expect(Z.divRound(7, 2)).toBe(3);
    expect(Z.divRound(-7, 2)).toBe(-3);
    expect(Z.divRound(8, 3)).toBe(3);
    expect(Z.divRound(-8, 3)).toBe(-3);
    expect(Z.divRound(2n ** 60n + 2n, 2n ** 59n)).toBe(2);
  });
});

describe('rings', () => {
  it('F_p inverts every nonzero residue', () => {
    for (const p of [2, 3, 5, 7, 101]) {
      const f = primeField(p);
      for (let a = 1; a < Math.min(p, 50); a++) expect(f.mul(a, f.inv(a))).toBe(1);
      expect(f.fromInt(-1)).toBe(p - 1);
      expect(f.fromInt(2n ** 70n)).toBe(Number(2n ** 70n % BigInt(p)));
    }
    expect(() => primeField(4)).toThrow(RangeError);
  });

  it('Q keeps fractions in lowest terms', () => {
    const q = rationals;
    const half = q.inv(q.fromInt(2));
    expect(q.add(half, half)).toEqual(q.one);
    expect(q.toText(q.mul(q.fromInt(-4), q.inv(q.fromInt(6))))).toBe('-2/3');
  });
});

describe('rank and Smith form', () => {
  it('rank depends on the characteristic', () => {
    const m = dense([
      [1, 1],
      [1, -1],
    ]); // determinant -2
    expect(smith(m).rank).toBe(2);
    expect(smith(m).invariants).toEqual([2]);
    const f2 = primeField(2);
    expect(rank(f2, sparse(2, 2, [[0, 0, 1], [0, 1, 1], [1, 0, 1], [1, 1, 1]], f2.add, f2.isZero))).toBe(1);
    const f3 = primeField(3);
    expect(rank(f3, sparse(2, 2, [[0, 0, 1], [0, 1, 1], [1, 0, 1], [1, 1, 2]], f3.add, f3.isZero))).toBe(2);
  });

  it('finds invariant factors and their prime powers', () => {
    const s = smith(dense([
      [2, 0, 0],
      [0, 3, 0],
      [0, 0, 0],
    ]));
    expect(s.rank).toBe(2);
    expect(s.invariants).toEqual([6]); // Z/2 + Z/3 = Z/6
    expect(s.primary).toEqual([2, 3]);
    // diag(2, 4) and diag(12, 18) (Newman, ch. II: SNF of diag(12,18) is diag(6, 36)).
    expect(smith(dense([[2, 0], [0, 4]])).invariants).toEqual([2, 4]);
    expect(smith(dense([[12, 0], [0, 18]])).invariants).toEqual([6, 36]);
    // A non-diagonal matrix: [[2,4],[6,8]] has determinant -8 and gcd of entries 2: SNF diag(2,4).
    expect(smith(dense([[2, 4], [6, 8]])).invariants).toEqual([2, 4]);
  });

  it('stays exact when entries pass 2^53', () => {
    const a = 2n ** 40n;
    const s = smith(dense([
      [a, a + 2n],
      [a + 2n, a],
    ])); // det = a^2 - (a+2)^2 = -4(a+1), entries' gcd 2: SNF diag(2, 2(a+1))
    expect(s.invariants).toEqual([2, Z.norm(2n * (a + 1n))]);
    expect(primePowers(2 ** 20 * 9)).toEqual([2 ** 20, 9]);
    // Elimination by a unit pivot multiplies entries: 3^20 * 3^20 > 2^53 must not round.
    const b = 3n ** 20n;
    const t = smith(dense([
      [1, b],
      [b, 0],
    ])); // det = -3^40, gcd of entries 1: SNF diag(1, 3^40)
    expect(t.invariants).toEqual([3n ** 40n]);
  });

  it('agrees with ranks over Q and F_p on random matrices (rank_Q - rank_Fp = number of invariant factors divisible by p)', () => {
    const rnd = seededRng(7);
    for (let t = 0; t < 400; t++) {
      const [rows, cols] = [1 + Math.floor(rnd() * 6), 1 + Math.floor(rnd() * 6)];
      const triples: [number, number, number][] = [];
      for (let i = 0; i < rows; i++) for (let j = 0; j < cols; j++) if (rnd() < 0.5) triples.push([i, j, [2, -2, 4, 3, 1, -1, 6][Math.floor(rnd() * 7)]]);
      const s = smith(sparse(rows, cols, triples, Z.add, Z.isZero));
      const q = rank(rationals, sparse(rows, cols, triples.map(([i, j, v]) => [i, j, rationals.fromInt(v)] as const), rationals.add, rationals.isZero));
      expect(s.rank).toBe(q);
      for (const p of [2, 3]) {
        const f = primeField(p);
        const rp = rank(f, sparse(rows, cols, triples.map(([i, j, v]) => [i, j, f.fromInt(v)] as const), f.add, f.isZero));
        expect(s.invariants.filter((d) => Z.isZero(Z.rem(d, p))).length).toBe(q - rp);
      }
    }
  });

  it('handles empty and zero matrices', () => {
    expect(smith(sparse(0, 0, [], Z.add, Z.isZero))).toEqual({ rank: 0, invariants: [], primary: [] });
    expect(rank(rationals, sparse(3, 2, [], rationals.add, rationals.isZero))).toBe(0);
    expect(rank(rationals, sparse(1, 1, [[0, 0, rationals.fromInt(5)]], rationals.add, rationals.isZero))).toBe(1);
  });
});
