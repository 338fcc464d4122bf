// The engine's crossing order (shared/khovanov/order.ts): a permutation of the crossings on
// random diagrams, kinks, split links, framed cables and the empty code; and the engine in it,
// and in both orders it is chosen from, equals the reference cube.
import fc from 'fast-check';
import { cubeKhovanov } from '@/shared/khovanov/cube';
import { fastKhovanov, withUnknots } from '@/shared/khovanov/engine';
import { crossingOrder, greedyOrder } from '@/shared/khovanov/order';
import { contractionOrder, cutWidths } from '@/shared/knot/contraction-order';
import { fromBraid } from '@/shared/knot/braid';
import { diagram } from '@/shared/knot/diagram';
import { cable } from '@/shared/knot/families/cable';
import { disjointUnion } from '@/shared/knot/families';
import { arbDiagram } from './arbitraries';
import { cubeRings, table } from './khovanov-fixtures';

const isPermutation = (order: readonly number[], n: number) => order.length === n && new Set(order).size === n && order.every((k) => Number.isInteger(k) && k >= 0 && k < n);

describe('crossingOrder', () => {
  it('is a permutation of the crossings that closes every end', () => {
    fc.assert(
      fc.property(arbDiagram(16), (d) => {
        const order = crossingOrder(d.pd);
        expect(isPermutation(order, d.pd.length)).toBe(true);
        // every label occurs twice, so all ends are closed once every crossing is in (common practice)
        if (d.pd.length > 0) expect(cutWidths(d.pd, order).at(-1)).toBe(0);
      }),
      { numRuns: 80 },
    );
  });

  it('handles kinks, split links, framed cables and the empty code', () => {
    expect(crossingOrder([])).toEqual([]);
    expect(crossingOrder([[1, 1, 2, 2]])).toEqual([0]);
    const codes = [
      disjointUnion(fromBraid([1, 1, 1]), fromBraid([1, -2, 1, -2])).pd,
      // the framing twists of a 0-framed trefoil's (2,1)-cable: a braid region beside the grids
      cable(diagram(fromBraid([1, 1, 1]).pd, { framings: [0] }), 0, 2, 1).pd,
    ];
    for (const pd of codes) expect(isPermutation(crossingOrder(pd), pd.length)).toBe(true);
  });
});

describe('the engine in the crossing order and in the greedy and tree orders = reference cube', () => {
  it('on random diagrams up to 8 crossings', () => {
    fc.assert(
      fc.property(arbDiagram(8), (d) => {
        // the cube reads the empty code as an unknot already
        fc.pre(d.pd.length > 0);
        const orders = [crossingOrder(d.pd), greedyOrder(d.pd).order, contractionOrder(d.pd).order];
        for (const [name, ring] of cubeRings) {
          const cube = table(withUnknots(cubeKhovanov(d.pd, ring), d.unknots));
          orders.forEach((order, k) => expect([name, k, table(fastKhovanov(d.pd, ring, { order, unknots: d.unknots }))]).toEqual([name, k, cube]));
        }
      }),
      { numRuns: 12 },
    );
  });
});
