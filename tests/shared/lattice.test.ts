// Integer lattices (shared/linalg/lattice.ts): the echelon's normal form and the integer kernel,
// checked on random small matrices against facts that hold for any input (no tuned values):
// a kernel basis lies in the kernel and has rank cols - rank (rank-nullity; the rank from the
// Smith form, Newman, Integral Matrices, 1972, ch. II); the normal form of v + (a lattice
// vector) is that of v (Hermite normal form uniqueness, Cohen 1993, section 2.4.2).

import { seededRng } from '@/shared/knot/moves/random';
import * as Z from '@/shared/linalg/int';
import { Int } from '@/shared/linalg/int';
import { bezout, combine, dot, kernel, ZEchelon } from '@/shared/linalg/lattice';
import { smith } from '@/shared/linalg/smith';
import { sparse } from '@/shared/linalg/sparse';

const rng = seededRng(2103);
const small = (): number => Math.floor(rng() * 7) - 3;
const randomVector = (length: number): Map<number, Int> => new Map(Array.from({ length }, (_, i) => [i, small()] as [number, Int]).filter(([, x]) => x !== 0));

describe('integer lattices', () => {
  it('Bezout: s a + t b = gcd(a, b) (the extended Euclidean algorithm, from memory)', () => {
    for (const [a, b] of [[12, 18], [-7, 5], [0, 4], [9, 0], [-6, -4]] as const) {
      const [g, s, t] = bezout(a, b);
      expect(g).toBe(Z.gcd(a, b));
      expect(Z.add(Z.mul(s, a), Z.mul(t, b))).toBe(g);
    }
  });

  it('a kernel basis lies in the kernel and has cols - rank vectors', () => {
    for (let trial = 0; trial < 30; trial++) {
      const [rows, cols] = [1 + Math.floor(rng() * 5), 1 + Math.floor(rng() * 7)];
      const columns = Array.from({ length: cols }, () => randomVector(rows));
      const basis = [...kernel(cols, (i) => columns[i])];
      for (const k of basis) {
        const image = [...k].reduce<Map<number, Int>>((sum, [i, x]) => combine(1, sum, x, columns[i]), new Map());
        expect(image.size).toBe(0);
      }
      const m = sparse(cols, rows, columns.flatMap((c, i) => [...c].map(([j, x]) => [i, j, x] as const)), Z.add, Z.isZero);
      expect(basis.length).toBe(cols - smith(m).rank);
    }
  });

  it('the normal form is the same on a whole coset, and nonnegative at every pivot', () => {
    for (let trial = 0; trial < 30; trial++) {
      const length = 2 + Math.floor(rng() * 6);
      const gens = Array.from({ length: 1 + Math.floor(rng() * 4) }, () => randomVector(length));
      const echelon = new ZEchelon();
      gens.forEach((g) => echelon.add(g));
      const v = randomVector(length);
      const moved = gens.reduce((w, g) => combine(1, w, small(), g), v);
      const normal = echelon.reduce(v);
      expect([...echelon.reduce(moved)].sort()).toEqual([...normal].sort());
      const pivotRows = echelon.pivots();
      for (const p of pivotRows) expect(Z.sign(normal.get(p) ?? 0)).toBeGreaterThanOrEqual(0);
      // The coset's normal form differs from v by a lattice vector: its dot with the lattice's annihilators is v's.
      const annihilators = [...kernel(length, (i) => new Map(gens.flatMap((g, j) => (g.has(i) ? [[j, g.get(i)!] as [number, Int]] : []))))];
      for (const a of annihilators) expect(dot(a, normal)).toBe(dot(a, v));
    }
  });
});
