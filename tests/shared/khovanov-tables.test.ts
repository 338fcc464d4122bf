// Published Khovanov homology tables, checked on the fast engine and (where small) on the
// reference cube. Gradings: Bar-Natan 2002 (docs/conventions.md). Each value names its source.

import { cubeKhovanov } from '@/shared/khovanov/cube';
import { khovanov, KhResult } from '@/shared/khovanov';
import { integers } from '@/shared/linalg/ring';
import { pdOf, table, torusWord } from './khovanov-fixtures';

const kh = (word: number[], reduced = false): KhResult => khovanov(pdOf(word), { ring: 'Z', reduced });

describe('published tables over Z', () => {
  it('unknot and unlink', () => {
    // Khovanov 2000 (arXiv math/9908171): Kh(unknot) = V = Z{1} + Z{-1}, disjoint union = tensor.
    expect(table(khovanov([], { ring: 'Z' }).groups)).toEqual(['0,-1:1', '0,1:1']);
    // docs/conventions.md (Bar-Natan 2002 normalisation): the reduced unknot is Z at (0,0).
    expect(table(khovanov([], { ring: 'Z', reduced: true }).groups)).toEqual(['0,0:1']);
    expect(table(kh([1])).sort()).toEqual(['0,-1:1', '0,1:1']); // a one-crossing unknot
    expect(table(kh([1, -1]))).toEqual(['0,-2:1', '0,0:2', '0,2:1']); // V (x) V
    expect(table(khovanov([], { ring: 'Z', unknots: 2 }).groups)).toEqual(['0,-2:1', '0,0:2', '0,2:1']);
  });

  it('a split unknot tensors with V; reduced at that unknot gives back Kh (Khovanov 2000, arXiv math/9908171: Kh of a disjoint union is the tensor product; from memory)', () => {
    const trefoil = pdOf([1, 1, 1]);
    const withUnknot = khovanov(trefoil, { ring: 'Z', unknots: 1 }).groups;
    const times = (g: { i: number; j: number; free: number; torsion: number[] }[], shift: number) => g.map((x) => ({ ...x, j: x.j + shift }));
    const base = kh([1, 1, 1]).groups;
    const expected = new Map<string, { i: number; j: number; free: number; torsion: number[] }>();
    for (const g of [...times(base, 1), ...times(base, -1)]) {
      const k = `${g.i},${g.j}`;
      const e = expected.get(k) ?? { i: g.i, j: g.j, free: 0, torsion: [] };
      expected.set(k, { ...e, free: e.free + g.free, torsion: [...e.torsion, ...g.torsion].sort((a, b) => a - b) });
    }
    expect(table(withUnknot)).toEqual(table([...expected.values()].sort((a, b) => a.i - b.i || a.j - b.j)));
    expect(table(khovanov(trefoil, { ring: 'Z', unknots: 1, reduced: true, component: 1 }))).toEqual(table(base));
    expect(khovanov(trefoil, { ring: 'Z', unknots: 1 }).euler?.ok).toBe(true);
  });

  it('split unknots as kinks through the complex = unknots tensored on at the end (Reidemeister I: a kink is an unknot)', () => {
    // Trefoil [[1,5,2,4],[3,1,4,6],[5,3,6,2]] and two split one-crossing kinks on fresh labels.
    const trefoil = pdOf([1, 1, 1]);
    const kinks = [[7, 7, 8, 8], [9, 10, 10, 9]] as const;
    for (const ring of ['Z', 'F2'] as const) {
      expect(table(khovanov([...trefoil, ...kinks], { ring }))).toEqual(table(khovanov(trefoil, { ring, unknots: 2 })));
    }
    expect(table(khovanov([...trefoil, ...kinks], { ring: 'Z' }))).toEqual(table(cubeKhovanov([...trefoil, ...kinks], integers)));
  });

  it('many unknots: ranks C(k, m) at j = k - 2m, exactly; refused where a rank passes 2^53; the empty link is Z at (0,0)', () => {
    // V^(x)40 (Khovanov 2000, arXiv math/9908171), ranks by the binomial theorem (common practice).
    const groups = khovanov([], { ring: 'Z', unknots: 40 }).groups;
    expect(groups).toHaveLength(41);
    expect(groups[20]).toEqual({ i: 0, j: 0, free: 137846528820, torsion: [] }); // C(40, 20)
    expect(groups.reduce((s, g) => s + g.free, 0)).toBe(2 ** 40);
    expect(() => khovanov([], { ring: 'Z', unknots: 70 })).toThrow(RangeError);
    // Khovanov 2000: Kh of the empty link is Z in degree (0,0) by definition.
    expect(table(khovanov([], { ring: 'Z', unknots: 0 }))).toEqual(['0,0:1']);
  });

  it('positive Hopf link', () => {
    // Bar-Natan 2002 (arXiv math/0201043), the Hopf link with positive crossings (from memory).
    expect(table(kh([1, 1]))).toEqual(['0,0:1', '0,2:1', '2,4:1', '2,6:1']);
  });

  it('trefoils', () => {
    // docs/conventions.md and Bar-Natan 2002 (arXiv math/0201043), table for 3_1.
    const right = ['0,1:1', '0,3:1', '2,5:1', '3,7:0+Z/2', '3,9:1'];
    expect(table(kh([1, 1, 1]))).toEqual(right);
    expect(table(cubeKhovanov(pdOf([1, 1, 1]), integers))).toEqual(right);
    // The left-handed trefoil: its mirror (Bar-Natan 2002, same table).
    expect(table(kh([-1, -1, -1]))).toEqual(['-3,-9:1', '-2,-7:0+Z/2', '-2,-5:1', '0,-3:1', '0,-1:1']);
    // Reduced right trefoil: q^2 + t^2 q^6 + t^3 q^8 (Khovanov, "Patterns in knot cohomology I",
    // 2003, arXiv math/0201306, in Bar-Natan's grading; from memory).
    expect(table(kh([1, 1, 1], true))).toEqual(['0,2:1', '2,6:1', '3,8:1']);
  });

  it('figure-eight knot', () => {
    // Bar-Natan 2002 (arXiv math/0201043), table for 4_1.
    const expected = ['-2,-5:1', '-1,-3:0+Z/2', '-1,-1:1', '0,-1:1', '0,1:1', '1,1:1', '2,3:0+Z/2', '2,5:1'];
    expect(table(kh([1, -2, 1, -2]))).toEqual(expected);
    expect(table(cubeKhovanov(pdOf([1, -2, 1, -2]), integers))).toEqual(expected);
  });

  it('T(2,n) for odd n', () => {
    // Khovanov 2000 (arXiv math/9908171), Sect. 6.2: for the positive (2,n) torus knot,
    // Z at (0,n-2), (0,n); for k = 1..(n-1)/2: Z at (2k, n+4k-2) and (2k+1, n+4k+2), Z/2 at
    // (2k+1, n+4k) (the formula as recalled, in Bar-Natan's grading).
    for (const n of [3, 5, 7, 9]) {
      const expected = [`0,${n - 2}:1`, `0,${n}:1`];
      for (let k = 1; k <= (n - 1) / 2; k++) expected.push(`${2 * k},${n + 4 * k - 2}:1`, `${2 * k + 1},${n + 4 * k}:0+Z/2`, `${2 * k + 1},${n + 4 * k + 2}:1`);
      expect(table(kh(torusWord(2, n)))).toEqual(expected.sort((a, b) => cmp(a, b)));
    }
  });

  it('T(4,5) has Z/4 torsion and T(5,6) has Z/3 and Z/5 torsion', () => {
    // Mukherjee, Przytycki, Silvero, Wang, Yang, "Search for torsion in Khovanov homology",
    // 2018, arXiv 1701.04924.
    const orders = (r: KhResult) => new Set(r.groups.flatMap((g) => g.torsion));
    expect(orders(kh(torusWord(4, 5))).has(4)).toBe(true);
    const t56 = orders(kh(torusWord(5, 6)));
    expect(t56.has(3)).toBe(true);
    expect(t56.has(5)).toBe(true);
  });
});

describe('the result record', () => {
  it('summarises the right trefoil', () => {
    const r = kh([1, 1, 1]);
    expect(r.ring).toBe('Z');
    expect(r.poincareText).toBe('q + q^3 + h^2 q^5 + h^3 q^9');
    expect(r.poincare).toEqual([[0, 1, 1], [0, 3, 1], [2, 5, 1], [3, 9, 1]]);
    // Jones of the right trefoil t + t^3 - t^4 (docs/conventions.md): (q + q^-1)(q^2 + q^6 - q^8).
    expect(r.euler).toEqual({ computed: [[1, '1'], [3, '1'], [5, '1'], [9, '-1']], expected: [[1, '1'], [3, '1'], [5, '1'], [9, '-1']], ok: true });
    // Thin: Lee 2005, "An endomorphism of the Khovanov invariant", arXiv math/0210213: Kh of an
    // alternating knot lies on the two diagonals j - 2i = -sigma +- 1; the table above (Bar-Natan
    // 2002) has groups on both (j - 2i = 1 and 3), so the width is exactly 2.
    expect([r.width, r.thin]).toEqual([2, true]);
    const red = kh([1, 1, 1], true);
    // Reduced Kh of an alternating knot lies on one diagonal (Manolescu, Ozsvath, "On the
    // Khovanov and knot Floer homologies of quasi-alternating links", 2007, arXiv 0708.3249);
    // the reduced table above (Khovanov 2003) is all on j - 2i = 2, so the width is 1.
    expect([red.reduced, red.width, red.thin]).toEqual([true, 1, true]);
  });

  it('names rings and rejects bad ones', () => {
    expect(khovanov(pdOf([1, 1, 1]), { ring: 'F2' }).ring).toBe('F2');
    expect(khovanov(pdOf([1, 1, 1]), { ring: { p: 3 } }).ring).toBe('F3');
    expect(() => khovanov(pdOf([1, 1, 1]), { ring: 'F4' })).toThrow(RangeError);
    expect(() => khovanov(pdOf([1, 1, 1]), { ring: 'Z', reduced: true, component: 1 })).toThrow(RangeError);
  });
});

function cmp(a: string, b: string): number {
  const [i1, j1] = a.split(':')[0].split(',').map(Number);
  const [i2, j2] = b.split(':')[0].split(',').map(Number);
  return i1 - i2 || j1 - j2;
}
