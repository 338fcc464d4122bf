// The tree-decomposition crossing order: a permutation whose reported cut and cost are those of
// the order, on random diagrams, kinks, split links and the empty code.
import fc from 'fast-check';
import { contractionOrder, cutWidths, scoreOrder } from '@/shared/knot/contraction-order';
import { disjointUnion, torusLink } from '@/shared/knot/families';
import { fromBraid } from '@/shared/knot/braid';
import { arbDiagram } from './arbitraries';

const isPermutation = (order: number[], n: number) => order.length === n && new Set(order).size === n && order.every((k) => k >= 0 && k < n);

describe('contractionOrder', () => {
  it('is a permutation of the crossings, scored as scoreOrder scores it', () => {
    fc.assert(
      fc.property(arbDiagram(16), (d) => {
        const c = contractionOrder(d.pd);
        expect(isPermutation(c.order, d.pd.length)).toBe(true);
        expect({ widest: c.widest, cost: c.cost }).toEqual(scoreOrder(d.pd, c.order));
        // every end is closed once all crossings are in (common practice: each label occurs twice)
        if (d.pd.length > 0) expect(cutWidths(d.pd, c.order).at(-1)).toBe(0);
      }),
      { numRuns: 60 },
    );
  });

  it('reaches the least possible cut of 4 on T(2,q), a cycle of doubled edges', () => {
    // Any proper nonempty subset of a cycle of doubled edges cuts at least two doubled edges
    // (common practice), and sweeping along the cycle cuts exactly two.
    for (const q of [3, 8, 21]) expect(contractionOrder(torusLink(2, q).pd).widest).toBe(4);
  });

  it('handles kinks, split links and the empty code', () => {
    expect(contractionOrder([])).toEqual({ order: [], widest: 0, cost: 0 });
    const kink = contractionOrder([[1, 1, 2, 2]]); // a one-crossing unknot
    expect(kink.order).toEqual([0]);
    expect(kink.widest).toBe(0);
    const split = disjointUnion(fromBraid([1, 1, 1]), fromBraid([1, -2, 1, -2]));
    const c = contractionOrder(split.pd);
    expect(isPermutation(c.order, split.pd.length)).toBe(true);
    // a split diagram never needs more than its widest piece: finish one piece, then the other
    expect(c.widest).toBeLessThanOrEqual(Math.max(contractionOrder(fromBraid([1, 1, 1]).pd).widest, contractionOrder(fromBraid([1, -2, 1, -2]).pd).widest));
  });
});
