// Sparse F2 elimination (shared/linalg/f2.ts) against brute force on small random systems: the
// span enumerated in full, vectors as bit masks (common practice).
import { F2Echelon, kernel, parity, xor } from '@/shared/linalg/f2';
import { seededRng } from '@/shared/knot/moves';

const toList = (mask: number, n: number): number[] => Array.from({ length: n }, (_, i) => i).filter((i) => (mask >> i) & 1);
const toMask = (v: readonly number[]): number => v.reduce((m, i) => m | (1 << i), 0);

describe('F2 echelon forms', () => {
  const rng = seededRng(7);
  const random = (n: number): number => Math.floor(rng() * (1 << n));

  it('xor and parity are the symmetric difference', () => {
    expect(xor([1, 3, 5], [3, 4])).toEqual([1, 4, 5]);
    expect(parity([5, 1, 5, 2, 1, 1])).toEqual([1, 2]);
  });

  it('two vectors have the same normal form exactly when their sum is in the span', () => {
    for (let trial = 0; trial < 40; trial++) {
      const n = 6;
      const rows = Array.from({ length: 1 + Math.floor(rng() * 5) }, () => random(n));
      const span = new Set([0]);
      for (const r of rows) for (const s of [...span]) span.add(s ^ r);
      const e = new F2Echelon();
      rows.forEach((r) => e.add(toList(r, n)));
      expect(2 ** e.rank).toBe(span.size);
      const [u, v] = [random(n), random(n)];
      const same = toMask(e.reduce(toList(u, n))) === toMask(e.reduce(toList(v, n)));
      expect(same).toBe(span.has(u ^ v));
    }
  });

  it('the kernel vectors are a basis of the kernel', () => {
    for (let trial = 0; trial < 30; trial++) {
      const [cols, n] = [5, 4];
      const images = Array.from({ length: cols }, () => random(n));
      const basis = [...kernel(cols, (i) => toList(images[i], n))].map(toMask);
      const image = (m: number): number => toList(m, cols).reduce((s, i) => s ^ images[i], 0);
      const all = Array.from({ length: 1 << cols }, (_, m) => m).filter((m) => image(m) === 0);
      basis.forEach((k) => expect(image(k)).toBe(0));
      const spanned = new Set([0]);
      for (const k of basis) for (const s of [...spanned]) spanned.add(s ^ k);
      expect(spanned.size).toBe(all.length);
    }
  });
});
