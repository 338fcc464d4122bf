// The canonical PD code behind the reuse of run results (shared/knot/canonical.ts): the same
// for every relabelling and reordering of a diagram, different for a different diagram.
import fc from 'fast-check';
import { canonicalPD } from '@/shared/knot/canonical';
import { diagram } from '@/shared/knot/diagram';
import { fromBraid } from '@/shared/knot/braid';
import { mirror } from '@/shared/knot/families';
import { jones } from '@/shared/knot/jones';
import { seededRng } from '@/shared/knot/moves/random';
import { orient, type PDCode } from '@/shared/knot/pd';
import { arbDiagram } from './arbitraries';
import { scramble } from './scramble';

/** Every component passes under somewhere, so any relabelling keeps the orientation (docs/conventions.md). */
const allUnder = (pd: PDCode) => {
  const o = orient(pd);
  const under = new Set(pd.map((x) => o.componentOf.get(x[0])));
  return o.components.every((_, c) => under.has(c));
};

describe('canonicalPD', () => {
  it('is the same for every relabelling and reordering of a diagram', () => {
    fc.assert(
      fc.property(arbDiagram(12), fc.integer(), (d, seed) => {
        fc.pre(d.pd.length > 0 && allUnder(d.pd));
        const s = scramble(d.pd, seededRng(seed));
        expect(canonicalPD(s.pd)).toEqual(canonicalPD(d.pd));
        // Marked: the same component, whatever number orient() gives it in the scrambled code.
        const o = orient(d.pd);
        const marked = o.componentOf.get(o.components[0][0])!;
        const same = orient(s.pd).componentOf.get(s.rename.get(o.components[0][0])!)!;
        expect(canonicalPD(s.pd, same)).toEqual(canonicalPD(d.pd, marked));
      }),
      { numRuns: 150 },
    );
  });

  it('is a relabelling of the diagram: same Jones polynomial, and canonical again is itself', () => {
    fc.assert(
      fc.property(arbDiagram(10), (d) => {
        const c = canonicalPD(d.pd);
        expect(c).toHaveLength(d.pd.length);
        expect(jones(diagram(c, { unknots: d.unknots })).equals(jones(d))).toBe(true);
        expect(canonicalPD(c)).toEqual(c);
      }),
      { numRuns: 100 },
    );
  });

  it('tells a chiral knot from its mirror image', () => {
    // The trefoil is chiral: its Jones polynomial t + t^3 - t^4 is not symmetric (docs/conventions.md; from memory).
    const trefoil = fromBraid([1, 1, 1]);
    expect(canonicalPD(mirror(trefoil).pd)).not.toEqual(canonicalPD(trefoil.pd));
  });

  it('keeps the marked component first, so reduced runs at different components differ', () => {
    // T(2,4) with a kink added on one component only: the components are not interchangeable.
    const d = fromBraid([1, 1, 1, 1, 2], 3);
    expect(orient(d.pd).components.length).toBe(2);
    expect(canonicalPD(d.pd, 0)).not.toEqual(canonicalPD(d.pd, 1));
    expect(canonicalPD([])).toEqual([]);
  });
});
