// Khovanov homology of cables (shared/knot/families/cable.ts): the engine against the reference
// cube on small cables, framed unknots against torus links from their braids, and mirrors.

import { khovanov, KhRing } from '@/shared/khovanov';
import { cubeKhovanov } from '@/shared/khovanov/cube';
import { fastKhovanov } from '@/shared/khovanov/engine';
import { contractionOrder } from '@/shared/knot/contraction-order';
import { fromBraid } from '@/shared/knot/braid';
import { diagram, Diagram } from '@/shared/knot/diagram';
import { cable } from '@/shared/knot/families/cable';
import { mirror } from '@/shared/knot/families/mirror';
import { integers, primeField, Ring } from '@/shared/linalg/ring';
import { cubeRings, mirrorDual, table, torusWord } from './khovanov-fixtures';

const kh = (d: Diagram, ring: KhRing) => khovanov(d.pd, { ring, unknots: d.unknots, eulerCheck: false }).groups;
const trefoil = fromBraid([1, 1, 1]);
const hopf = fromBraid([1, 1]);
const eight = fromBraid([1, -2, 1, -2]);
const framedUnknot = (n: number): Diagram => diagram([], { unknots: 1, framings: [n] });

describe('fast engine = reference cube on cables (<= 12 crossings)', () => {
  const rings = cubeRings;
  const cables: [string, Diagram][] = [
    ['(2,0)-cable of the blackboard trefoil', cable(trefoil, 0, 2, 0)],
    ['(1,1)-cable of the blackboard trefoil', cable(trefoil, 0, 1, 1)],
    ['(2,1)-cable of the Hopf link', cable(hopf, 0, 2, 1)],
    ['(1,1)-cable of the +2-framed unknot', cable(framedUnknot(2), 0, 1, 1)],
    ['(2,1)-cable of the -1-framed unknot', cable(framedUnknot(-1), 0, 2, 1)],
    ['(2,0)-cable of the 1-framed Hopf link', cable(diagram(hopf.pd, { framings: [1, 0] }), 0, 2, 0)],
  ];
  it.each(cables)('%s', (_, d) => {
    expect(d.pd.length).toBeLessThanOrEqual(12);
    const tree = contractionOrder(d.pd).order;
    for (const [name, ring] of rings) {
      const cube = table(cubeKhovanov(d.pd, ring));
      expect([name, table(kh(d, name))]).toEqual([name, cube]);
      // The tree-decomposition order too, which the engine takes wherever that is cheaper.
      expect([name, 'tree order', table(fastKhovanov(d.pd, ring, { order: tree, unknots: d.unknots }))]).toEqual([name, 'tree order', cube]);
      // Sub-tangles of four crossings built alone and glued (parts.ts; equal ones built once).
      expect([name, 'parts', table(fastKhovanov(d.pd, ring, { parts: blocks(d.pd.length, 4), unknots: d.unknots }))]).toEqual([name, 'parts', cube]);
    }
  });

  it('every crossing\'s grid built once and the copies glued = the crossing-by-crossing engine, on the (2,0)-cable of the figure-eight (16 crossings)', () => {
    const d = cable(eight, 0, 2, 0);
    // The cable code lists each original crossing's 2 x 2 grid in turn (families/cable.ts).
    for (const ring of [integers as Ring<unknown>, primeField(3) as Ring<unknown>]) expect(table(fastKhovanov(d.pd, ring, { parts: blocks(16, 4) }))).toEqual(table(fastKhovanov(d.pd, ring)));
  });
});

/** 0..n-1 in consecutive blocks of `size` (the last may be shorter). */
function blocks(n: number, size: number): number[][] {
  return Array.from({ length: Math.ceil(n / size) }, (_, b) => Array.from({ length: Math.min(size, n - b * size) }, (_, i) => b * size + i));
}

describe('structure', () => {
  it('the (r,0)-cable of the n-framed unknot is T(r, rn): the same homology as the closure of (s1 ... s_{r-1})^(rn) (common practice)', () => {
    for (const [r, n] of [[2, 1], [2, -3], [3, 1], [3, -1], [3, 2], [4, 1]]) {
      const word = torusWord(r, Math.abs(r * n)).map((k) => Math.sign(n) * k);
      expect([r, n, table(kh(cable(framedUnknot(n), 0, r, 0), 'Z'))]).toEqual([r, n, table(kh(fromBraid(word, r), 'Z'))]);
    }
  });

  it('cables of mirrors are mirrors: the table dualises (the mirror rule of khovanov-fixtures)', () => {
    const framed: [string, Diagram, number, number][] = [
      ['trefoil, 0-framed', diagram(trefoil.pd, { framings: [0] }), 2, 0],
      ['trefoil, blackboard', trefoil, 1, 1],
      ['figure-eight, +1-framed', diagram(eight.pd, { framings: [1] }), 2, 0],
      ['Hopf link, 0-framed', hopf, 2, 1],
    ];
    for (const [name, d, rPlus, rMinus] of framed) {
      const z = kh(cable(d, 0, rPlus, rMinus), 'Z');
      expect([name, table(kh(cable(mirror(d), 0, rPlus, rMinus), 'Z'))]).toEqual([name, table(mirrorDual(z))]);
    }
  });

  it('every cable result passes the Euler check (q + q^-1) V (Khovanov 2000, arXiv math/9908171)', () => {
    for (const d of [cable(diagram(trefoil.pd, { framings: [0] }), 0, 2, 1), cable(eight, 0, 2, 0), cable(hopf, 1, 3, 0)]) {
      expect(khovanov(d.pd, { ring: 'Q', unknots: d.unknots }).euler?.ok).toBe(true);
    }
  });
});
