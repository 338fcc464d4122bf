// Theorems about Khovanov homology, checked on generated diagrams (seeded random braids), and
// the fast engine against the reference cube. Each property names its source.

import { cubeKhovanov } from '@/shared/khovanov/cube';
import { khovanov, KhCancelled, KhGroup, KhRing } from '@/shared/khovanov';
import { fastKhovanov } from '@/shared/khovanov/engine';
import { contractionOrder } from '@/shared/knot/contraction-order';
import { fromBraid } from '@/shared/knot/braid';
import { rationalLink } from '@/shared/knot/families/rational';
import { disjointUnion } from '@/shared/knot/families/union';
import { connectedSum } from '@/shared/knot/families/sum';
import { Braid, randomMarkovMove, randomMoves, seededRng } from '@/shared/knot/moves';
import { orient, PDCode } from '@/shared/knot/pd';
import { integers, primeField, rationals, Ring } from '@/shared/linalg/ring';
import { mirrorDual, pdOf, randomWord, table, torusWord } from './khovanov-fixtures';
import { scramble } from './scramble';

const rnd = seededRng(20261201);
/** Random braid words on 3 or 4 strands, `min`..`max` crossings. */
const words = (count: number, min: number, max: number, alternating = false): number[][] =>
  Array.from({ length: count }, () => randomWord(rnd, 3 + Math.floor(rnd() * 2), min + Math.floor(rnd() * (max - min + 1)), alternating));

const small = words(10, 3, 9);
const medium = words(8, 8, 14);
const alternating = words(8, 4, 12, true);

const kh = (pd: PDCode, ring: KhRing, reduced = false, component = 0): KhGroup[] => khovanov(pd, { ring, reduced, component, eulerCheck: false }).groups;
const at = (groups: readonly KhGroup[], i: number, j: number): KhGroup | undefined => groups.find((g) => g.i === i && g.j === j);
const dim = (groups: readonly KhGroup[], i: number, j: number): number => at(groups, i, j)?.free ?? 0;
const cells = (...tables: (readonly KhGroup[])[]): [number, number][] => {
  const keys = new Set(tables.flat().flatMap((g) => [`${g.i},${g.j}`, `${g.i - 1},${g.j}`, `${g.i},${g.j - 1}`, `${g.i},${g.j + 1}`]));
  return [...keys].map((k) => k.split(',').map(Number) as [number, number]);
};

describe('fast engine = reference cube', () => {
  const rings: [string, Ring<unknown>, KhRing][] = [
    ['Z', integers as Ring<unknown>, 'Z'],
    ['Q', rationals as Ring<unknown>, 'Q'],
    ['F2', primeField(2) as Ring<unknown>, 'F2'],
    ['F3', primeField(3) as Ring<unknown>, 'F3'],
  ];
  // Links with 2 and 3 components (T(2,4), the Borromean rings, a 3-component braid) besides the random words.
  const links = [[1, 1, 1, 1], [1, -2, 1, -2, 1, -2], [1, 1, -2, -2, 1, 2, 2, -1]];
  it.each([...small, ...links].map((w) => [w.join(' '), w]))('braid %s', (_, word) => {
    const pd = pdOf(word as number[]);
    const components = orient(pd).components;
    // The engine in the tree-decomposition order too, which it takes wherever that is cheaper.
    const tree = contractionOrder(pd).order;
    // And sub-tangles built alone and glued (parts.ts): the tree order cut at random places.
    const parts: number[][] = [];
    tree.forEach((k, i) => (i === 0 || rnd() < 0.4 ? parts.push([k]) : parts[parts.length - 1].push(k)));
    for (const [name, ring, khRing] of rings) {
      const cube = table(cubeKhovanov(pd, ring));
      expect([name, table(kh(pd, khRing))]).toEqual([name, cube]);
      expect([name, 'tree order', table(fastKhovanov(pd, ring, { order: tree }))]).toEqual([name, 'tree order', cube]);
      expect([name, 'parts', table(fastKhovanov(pd, ring, { parts }))]).toEqual([name, 'parts', cube]);
      const reducedCube = table(cubeKhovanov(pd, ring, components[0][0]));
      expect([name, 'reduced', table(kh(pd, khRing, true))]).toEqual([name, 'reduced', reducedCube]);
      expect([name, 'parts, reduced', table(fastKhovanov(pd, ring, { parts, marked: components[0][0] }))]).toEqual([name, 'parts, reduced', reducedCube]);
    }
    // Reduced at every other component, over Z.
    components.slice(1).forEach((labels, c) => {
      expect([c + 1, table(kh(pd, 'Z', true, c + 1))]).toEqual([c + 1, table(cubeKhovanov(pd, integers, labels[0]))]);
    });
  });
});

describe('fast engine = reference cube on larger diagrams', () => {
  it.each(words(2, 10, 11).map((w) => [w.join(' '), w]))('braid %s over Z and F5', (_, word) => {
    const pd = pdOf(word as number[]);
    expect(table(kh(pd, 'Z'))).toEqual(table(cubeKhovanov(pd, integers)));
    expect(table(kh(pd, 'F5'))).toEqual(table(cubeKhovanov(pd, primeField(5))));
  });
});

describe('theorems on generated diagrams', () => {
  it('graded Euler characteristic = (q + q^-1) V, reduced = V (Khovanov 2000, arXiv math/9908171; Bar-Natan 2002 normalisation)', () => {
    for (const w of [...small, ...medium]) {
      for (const reduced of [false, true]) {
        const r = khovanov(pdOf(w), { ring: 'Z', reduced });
        expect([w.join(' '), reduced, r.euler?.ok]).toEqual([w.join(' '), reduced, true]);
      }
    }
  });

  it('rank over Q is at least 2^components (Lee 2005, arXiv math/0210213: Lee homology has dimension 2^c)', () => {
    for (const w of [...small, ...medium]) {
      const pd = pdOf(w);
      const total = kh(pd, 'Q').reduce((s, g) => s + g.free, 0);
      expect(total).toBeGreaterThanOrEqual(2 ** orient(pd).components.length);
    }
  });

  it('alternating non-split links are thin with only Z/2 torsion (Lee 2005; Shumakovitch 2014, arXiv math/0405474)', () => {
    for (const w of alternating) {
      const r = khovanov(pdOf(w), { ring: 'Z' });
      expect([w.join(' '), r.thin, r.width <= 2]).toEqual([w.join(' '), true, true]);
      expect(r.groups.flatMap((g) => g.torsion).filter((t) => t !== 2)).toEqual([]);
      expect(khovanov(pdOf(w), { ring: 'Z', reduced: true }).width).toBe(1);
    }
    // Rational links from the knot core (2-bridge links are alternating: Burde-Zieschang, ch. 12).
    for (const f of [[2, 3], [3, 1, 2], [2, 2, 2, 1], [4, 3, 2], [1, 2, 3, 2]]) {
      const d = rationalLink(f);
      const r = khovanov(d.pd, { ring: 'Z', unknots: d.unknots });
      expect([f, r.thin, r.groups.flatMap((g) => g.torsion).filter((t) => t !== 2)]).toEqual([f, true, []]);
    }
  });

  it('T(3,4) = 8_19 is thick, on three diagonals (Bar-Natan 2002, arXiv math/0201043, tables)', () => {
    const r = khovanov(pdOf(torusWord(3, 4)), { ring: 'Z' });
    expect([r.thin, r.width]).toEqual([false, 3]);
  });

  it('universal coefficients relate Z to Q, F2 and F3 (H^i(C; F_p) = H^i (x) F_p + Tor(H^{i+1}, F_p))', () => {
    for (const w of [...small, ...medium.slice(0, 4)]) {
      const pd = pdOf(w);
      const z = kh(pd, 'Z');
      const q = kh(pd, 'Q');
      for (const [i, j] of cells(z, q)) expect([w.join(' '), 'Q', i, j, dim(q, i, j)]).toEqual([w.join(' '), 'Q', i, j, dim(z, i, j)]);
      const pTorsion = (p: number, i: number, j: number) => (at(z, i, j)?.torsion ?? []).filter((t) => t % p === 0).length;
      for (const p of [2, 3]) {
        const f = kh(pd, `F${p}`);
        for (const [i, j] of cells(z, f)) {
          expect([w.join(' '), p, i, j, dim(f, i, j)]).toEqual([w.join(' '), p, i, j, dim(z, i, j) + pTorsion(p, i, j) + pTorsion(p, i + 1, j)]);
        }
      }
    }
  });

  it('over F2, unreduced = reduced (x) (q + q^-1), at any component (Shumakovitch 2014, arXiv math/0405474)', () => {
    for (const w of [...small, ...medium.slice(0, 4)]) {
      const pd = pdOf(w);
      const un = kh(pd, 'F2');
      const count = orient(pd).components.length;
      for (let c = 0; c < count; c++) {
        const red = kh(pd, 'F2', true, c);
        for (const [i, j] of cells(un, red)) expect([w.join(' '), c, i, j, dim(un, i, j)]).toEqual([w.join(' '), c, i, j, dim(red, i, j - 1) + dim(red, i, j + 1)]);
      }
    }
  });

  it('the mirror dualises: free (i,j) -> (-i,-j), torsion (i,j) -> (1-i,-j) (Khovanov 2000, arXiv math/9908171, Sect. 7, from memory)', () => {
    for (const w of [...small, ...medium.slice(0, 3)]) {
      const z = kh(pdOf(w), 'Z');
      const m = kh(pdOf(w.map((k) => -k)), 'Z');
      expect(table(m)).toEqual(table(mirrorDual(z)));
    }
  });
});

describe('products (Kunneth over a field)', () => {
  // Poincare polynomial as a map "i,j" -> dimension, and the product of two.
  const poly = (g: readonly KhGroup[]) => new Map(g.map((x) => [`${x.i},${x.j}`, x.free]));
  const product = (a: readonly KhGroup[], b: readonly KhGroup[], shift = 0) => {
    const out = new Map<string, number>();
    for (const x of a) for (const y of b) {
      const k = `${x.i + y.i},${x.j + y.j + shift}`;
      out.set(k, (out.get(k) ?? 0) + x.free * y.free);
    }
    return out;
  };
  const sorted = (m: Map<string, number>) => [...m].sort();
  const pairs = [[small[0], small[1]], [small[2], alternating[0]], [[1, 1, 1], [1, -2, 1, -2]]];

  it('disjoint union: Kh(L1 u L2) = Kh(L1) (x) Kh(L2) over Q (Khovanov 2000, arXiv math/9908171)', () => {
    for (const [w1, w2] of pairs) {
      const d = disjointUnion(fromBraid(w1), fromBraid(w2));
      expect(sorted(poly(kh(d.pd, 'Q')))).toEqual(sorted(product(kh(pdOf(w1), 'Q'), kh(pdOf(w2), 'Q'))));
    }
  });

  it('connected sum of knots: reduced Kh multiplies over Q (Khovanov 2003, arXiv math/0201306; from memory)', () => {
    const knots = [...small, ...alternating].filter((w) => orient(pdOf(w)).components.length === 1).slice(0, 4);
    expect(knots.length).toBeGreaterThanOrEqual(2);
    for (let k = 0; k + 1 < knots.length; k += 2) {
      const d = connectedSum(fromBraid(knots[k]), fromBraid(knots[k + 1]));
      expect(sorted(poly(kh(d.pd, 'Q', true)))).toEqual(sorted(product(kh(pdOf(knots[k]), 'Q', true), kh(pdOf(knots[k + 1]), 'Q', true))));
    }
  });
});

describe('invariance (Kh is a link invariant: Khovanov 2000; Markov 1936 for braids)', () => {
  it('under relabelling the edges and reordering the crossings of the PD code', () => {
    for (const w of medium.slice(0, 4)) {
      const pd = pdOf(w);
      expect(table(kh(scramble(pd, rnd).pd, 'Z'))).toEqual(table(kh(pd, 'Z')));
    }
  });

  it('under random Reidemeister moves of the knot core (Reidemeister 1927)', () => {
    for (const [k, w] of medium.slice(0, 6).entries()) {
      const d = fromBraid(w);
      const moved = randomMoves(d, 3 + (k % 4), 1000 + k);
      const count = orient(d.pd).components.length;
      expect([w.join(' '), table(khovanov(moved.pd, { ring: 'Z', unknots: moved.unknots, eulerCheck: false }))]).toEqual([w.join(' '), table(kh(d.pd, 'Z'))]);
      if (count === 1) expect(table(khovanov(moved.pd, { ring: 'Z', reduced: true, unknots: moved.unknots, eulerCheck: false }))).toEqual(table(kh(d.pd, 'Z', true)));
    }
  });

  it('under random Markov moves of the knot core (Markov 1935)', () => {
    const rng = seededRng(77);
    for (const w of medium.slice(0, 5)) {
      let b: Braid = { word: w, strands: Math.max(...w.map(Math.abs)) + 1 };
      for (let k = 0; k < 4; k++) b = randomMarkovMove(b, rng);
      const d = fromBraid(b.word, b.strands);
      expect([b.word.join(' '), table(khovanov(d.pd, { ring: 'F3', unknots: d.unknots, eulerCheck: false }))]).toEqual([b.word.join(' '), table(kh(pdOf(w), 'F3'))]);
    }
  });

  it('T(p,q) and T(q,p) agree (the same link: Rolfsen, Knots and Links, 1976, 3.C)', () => {
    for (const [p, q] of [[2, 5], [3, 4], [3, 5], [4, 5], [3, 7]]) {
      expect([p, q, table(kh(pdOf(torusWord(p, q)), 'Z'))]).toEqual([p, q, table(kh(pdOf(torusWord(q, p)), 'Z'))]);
    }
  });

  it('under braid conjugation, stabilisation, R2 pairs and braid relations', () => {
    for (const w of medium.slice(0, 5)) {
      const strands = Math.max(...w.map(Math.abs)) + 1;
      const base = table(kh(pdOf(w), 'Z'));
      const k = 1 + Math.floor(rnd() * (w.length - 1));
      const g = 1 + Math.floor(rnd() * (strands - 1));
      const variants = [
        [...w.slice(k), ...w.slice(0, k)], // conjugation
        [...w, rnd() < 0.5 ? strands : -strands], // Markov stabilisation
        [...w.slice(0, k), g, -g, ...w.slice(k)], // Reidemeister II
        [...w.slice(0, k), 1, 2, 1, -2, -1, -2, ...w.slice(k)], // s1 s2 s1 = s2 s1 s2 (Reidemeister III)
      ];
      for (const v of variants) expect([v.join(' '), table(kh(pdOf(v), 'Z'))]).toEqual([v.join(' '), base]);
    }
  });
});

describe('progress and cancellation', () => {
  it('reports each merged crossing and the complex size', () => {
    const pd = pdOf([1, -2, 1, -2, 1, 2]);
    const seen: number[] = [];
    khovanov(pd, { ring: 'Q', onProgress: (p) => {
      expect(p.total).toBe(pd.length);
      expect(p.objects).toBeGreaterThan(0);
      seen.push(p.fraction);
    } });
    expect(seen).toEqual(pd.map((_, k) => (k + 1) / pd.length));
  });

  it('stops with KhCancelled when the signal is aborted', () => {
    const signal = { aborted: false };
    const run = () => khovanov(pdOf([1, 2, 1, 2, 1, 2, 1, 2]), { ring: 'Z', signal, onProgress: (p) => (signal.aborted = p.merged >= 2) });
    expect(run).toThrow(KhCancelled);
  });
});
