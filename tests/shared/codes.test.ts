import fc from 'fast-check';
import { fromBraid, parseBraid } from '@/shared/knot/braid';
import { componentCount, diagram } from '@/shared/knot/diagram';
import { fromDT, interlacedGroups, parseDT, toDT } from '@/shared/knot/dt';
import { fromGauss, toGauss } from '@/shared/knot/gauss';
import { jones } from '@/shared/knot/jones';
import { orient, parsePD, relabel } from '@/shared/knot/pd';
import { simplify } from '@/shared/knot/moves';
import { arbBraid } from './arbitraries';

describe('codes in and out', () => {
  it('braid closure: sigma_k > 0 is a positive crossing, untouched strands are unknots', () => {
    const d = fromBraid([1, 1, -2]);
    expect(orient(d.pd).signs).toEqual([1, 1, -1]);
    expect(fromBraid([1], 4).unknots).toBe(2);
    expect(componentCount(fromBraid([1, 1]))).toBe(2); // Hopf link (common practice)
    expect(parseBraid('1, -2 1')).toEqual([1, -2, 1]);
    expect(() => parseBraid('1 0')).toThrow('braid letter 2 must be a nonzero integer, got 0');
    expect(() => fromBraid([3], 2)).toThrow('braid letter 3 needs 4 strands, only 2 given');
  });

  it('PD -> signed Gauss -> PD is the identity on relabelled codes (property)', () => {
    fc.assert(
      fc.property(arbBraid(), (word) => {
        const d = fromBraid(word);
        const back = fromGauss(toGauss(d));
        expect(back.pd).toEqual(relabel(orient(d.pd)));
        expect(back.unknots).toBe(d.unknots);
        expect(toGauss(back)).toEqual(toGauss(d));
      }),
    );
  });

  it('keeps the direction of a two-edge component passing only over', () => {
    // Component 2 passes over crossings 1 then 2, or 2 then 1: opposite directions, opposite signs.
    for (const [over, signs] of [[[1, 2], [1, -1]], [[2, 1], [-1, 1]]]) {
      const d = fromGauss({ components: [[-1, -2], over], signs });
      expect(orient(d.pd).signs).toEqual(signs);
    }
  });

  it('signed Gauss code errors are precise', () => {
    expect(() => fromGauss({ components: [[1, -2]], signs: [1, 1] })).toThrow('crossing 1 must be passed once over and once under; it is passed 1 times over and 0 times under');
    expect(() => fromGauss({ components: [[1, -3]], signs: [1] })).toThrow('pass -3 does not name a crossing 1..1');
    expect(() => fromGauss({ components: [[1, -1]], signs: [2] })).toThrow('sign of crossing 1 must be 1 or -1, got 2');
    // Gauss code of two crossings interleaved like a virtual knot: not planar.
    expect(() => fromGauss({ components: [[1, -2, -1, 2]], signs: [1, 1] })).toThrow(/not planar/);
  });

  it('DT codes of small knots realise the right knots', () => {
    // 4 6 2 = trefoil, 4 6 8 2 = figure-eight, 6 8 10 2 4 = 5_1, 4 8 10 2 6 = 5_2 (DT codes from memory);
    // Jones values as in jones.test.ts (Lickorish; from memory), up to the reflection convention.
    expect(jones(fromDT([4, 6, 2])).format()).toBe('t + t^3 - t^4');
    expect(jones(fromDT([4, 6, 8, 2])).format()).toBe('t^-2 - t^-1 + 1 - t + t^2');
    expect(jones(fromDT([6, 8, 10, 2, 4])).format()).toBe('t^2 + t^4 - t^5 + t^6 - t^7');
    expect(jones(fromDT([4, 8, 10, 2, 6])).format()).toBe('t - t^2 + 2t^3 - t^4 + t^5 - t^6');
    expect(fromDT([]).unknots).toBe(1);
    expect(interlacedGroups([4, 6, 2])).toEqual([[0, 1, 2]]);
    expect(interlacedGroups([2, 6, 4]).length).toBe(3); // three kinks in a row: nothing interlaced
    expect(parseDT('4 6, 2')).toEqual([4, 6, 2]);
    expect(() => fromDT([4, 4, 2])).toThrow('DT entry 4 appears twice');
    expect(() => fromDT([3, 6, 2])).toThrow(/must be an even number between 2 and 6/);
    expect(() => toDT(fromBraid([1, 1]))).toThrow('a DT code describes a knot; this diagram has 2 components');
  });

  it('prime knot diagram -> DT -> knot keeps the Jones polynomial and the code (property)', () => {
    // Kinks are nugatory crossings, whose reflection a DT code does not record; simplify removes
    // them, and braid closures without them are prime diagrams in the cases generated here.
    const knotWord = arbBraid(10, 4).filter((w) => componentCount(fromBraid(w)) === 1);
    fc.assert(
      fc.property(knotWord, (word) => {
        const d = simplify(fromBraid(word));
        fc.pre(interlacedGroups(toDT(d)).length <= 1);
        const code = toDT(d);
        const back = fromDT(code);
        expect(jones(back).equals(jones(d))).toBe(true);
        expect(toDT(back)).toEqual(code);
      }),
      { numRuns: 60 },
    );
  });

  it('parses PD JSON and keeps crossingless components in a diagram', () => {
    const pd = parsePD('[[4,2,5,1],[2,6,3,5],[6,4,1,3]]');
    expect(diagram(pd, { unknots: 2 }).framings).toEqual([null, null, null]);
  });
});
