import { checkPlanar } from '@/shared/knot/moves/faces';
import { orient, parsePD, relabel, writhe } from '@/shared/knot/pd';
import { blackboardFramings, diagram, framingsOf } from '@/shared/knot/diagram';

// Right-handed trefoil in docs/conventions.md (checked: all signs +1).
const trefoil = [[4, 2, 5, 1], [2, 6, 3, 5], [6, 4, 1, 3]] as const;

describe('PD codes', () => {
  it('orients along a -> c and reads crossing signs (over-strand d -> b is positive)', () => {
    const o = orient(trefoil);
    expect(o.components).toEqual([[4, 5, 6, 1, 2, 3]]);
    expect(o.signs).toEqual([1, 1, 1]);
    expect(writhe(o)).toBe(3);
    // Rotating every crossing by one slot makes the over-strand the under-strand: the mirror.
    const mirror = trefoil.map(([a, b, c, d]) => [d, a, b, c] as const);
    expect(orient(mirror).signs).toEqual([-1, -1, -1]);
  });

  it('reads kinks of the form X[12,12,13,11] (a label twice in one crossing)', () => {
    // Two kinks in a row on one circle: 11 -> 12 (the loop of the first) -> 13 -> 14 -> 11.
    const pd = [[12, 12, 13, 11], [14, 14, 11, 13]] as const;
    checkPlanar(pd);
    const o = orient(pd);
    expect(o.components).toEqual([[12, 13, 14, 11]]);
    expect(o.signs).toEqual([1, 1]); // over-strand enters at d and leaves at b in both
    expect(orient([[1, 2, 2, 1]]).signs).toEqual([-1]); // d = a: the over-strand leaves through d
  });

  it('gives precise errors', () => {
    expect(() => orient([[1, 2, 3]] as never)).toThrow('crossing 1 must have exactly 4 labels, got [1,2,3]');
    expect(() => orient([[1, 2, 3, 4]])).toThrow('label 1 appears 1 time; each label must appear exactly twice');
    expect(() => orient([[1, 1.5, 1, 1.5]])).toThrow('label 1.5 is not an integer');
    expect(() => orient([[1, 2, 2, 1], [3, 4, 4, 5]])).toThrow('label 3 appears 1 time; each label must appear exactly twice');
    // The second crossing would need edge 2 to run into its own outgoing under-slot.
    expect(() => orient([[1, 3, 2, 4], [1, 4, 2, 3]])).toThrow(/inconsistent/);
    // Two crossings whose four edges all join the two crossings crosswise: a torus picture.
    expect(() => checkPlanar([[1, 2, 3, 4], [3, 1, 4, 2]])).toThrow('the PD code is not planar: it has 2 faces where a planar diagram with 2 crossings in 1 piece has 4');
    expect(() => parsePD('X')).toThrow(/must be JSON/);
    expect(() => parsePD('{}')).toThrow('a PD code must be an array of crossings');
    expect(() => diagram(trefoil, { framings: [1, 2] })).toThrow('2 framings given for 1 component');
    expect(() => diagram(trefoil, { unknots: -1 })).toThrow(/non-negative/);
    expect(() => diagram(trefoil, { framings: [0.5] })).toThrow('framing of component 1 must be an integer or null, got 0.5');
  });

  it('orients an over-only component so its labels increase', () => {
    // R2 bigon of two circles: {1,2} passes under twice, {3,4} only over. A two-edge loop
    // increases both ways; pd.ts then starts at the first crossing holding its smallest label.
    const pd = [[1, 4, 2, 3], [2, 4, 1, 3]] as const;
    const o = orient(pd);
    expect(o.components).toEqual([[1, 2], [3, 4]]);
    expect(o.tail.get(3)).toEqual({ crossing: 0, position: 3 }); // leaves crossing 1 towards 4
    expect(o.signs).toEqual([-1, 1]);
  });

  it('relabels along components keeping orientation', () => {
    const pd = [[10, 40, 20, 30], [20, 30, 10, 40]] as const;
    const r = relabel(orient(pd));
    expect(r).toEqual([[1, 4, 2, 3], [2, 3, 1, 4]]);
    expect(orient(r).signs).toEqual(orient(pd).signs);
  });

  it('computes blackboard framings and resolves null framings', () => {
    const d = diagram(trefoil, { unknots: 1, framings: [null, 5] });
    expect(blackboardFramings(d)).toEqual([3, 0]);
    expect(framingsOf(d)).toEqual([3, 5]);
  });
});
