// Standard pictures of families (shared/layout: pretzel-picture.ts, cable-picture.ts,
// sum-picture.ts): each is drawn only when it reads back with the family member's crossing
// count, components and Jones polynomial; these tests check invariants that read-back does not
// look at, and the shape of each picture.
import { analyse, Analysis } from '@/shared/drawing/analyse';
import { dist } from '@/shared/drawing/point';
import { alexander } from '@/shared/knot/alexander';
import { fromBraid } from '@/shared/knot/braid';
import { Diagram } from '@/shared/knot/diagram';
import { cable, connectedSum, mirror, pretzelLink, torusLink, twistKnot } from '@/shared/knot/families';
import { linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { linkingMatrix } from '@/shared/knot/linking';
import { cableSketch, closedBraidSketch, layoutPD, pretzelPicture, pretzelSketch, sketchPicture, sumSketch, type Picture } from '@/shared/layout';

/** The picture's link and the target agree on invariants of the link (Alexander polynomial, determinant, signature: theorems). */
function sameLink(a: Analysis, target: Diagram) {
  const read = a.diagram!.diagram;
  expect(JSON.stringify(alexander(read))).toBe(JSON.stringify(alexander(target)));
  expect(linkDeterminant(read)).toBe(linkDeterminant(target));
  expect(linkSignature(read)).toBe(linkSignature(target));
}

test('pretzel links: one column of |a_i| crossings per nonzero a_i, side by side', () => {
  for (const twists of [[-2, 3, 7], [1, 1, 1], [2, 2], [3], [-3, -3, -3], [2, -3, 5, 1], [0, 2, 3], [-1, -1], [4, -2], [-2, 3, -5, 2]]) {
    const sketch = pretzelSketch(twists);
    expect(sketch).not.toBeNull();
    const a = analyse(sketch!);
    sameLink(a, pretzelLink(twists));
    // The standard picture (common practice): crossings stacked in vertical columns, column i holding |a_i| of them, left to right.
    const columns = new Map<number, number>();
    for (const c of a.crossings) columns.set(Math.round(c.at.x), (columns.get(Math.round(c.at.x)) ?? 0) + 1);
    const xs = [...columns.keys()].sort((p, q) => p - q);
    expect(xs.map((x) => columns.get(x))).toEqual(twists.filter((t) => t !== 0).map(Math.abs));
  }
});

const trefoil = fromBraid([1, 1, 1]);
const figureEight = twistKnot(2);

test('2- and 3-cables of the trefoil and the figure-eight with framings 0, +1, -1: parallel copies, the framing as their linking number', () => {
  for (const [knot, writhe] of [[trefoil, 3], [figureEight, 0]] as const) {
    for (const r of [2, 3]) {
      for (const f of [0, 1, -1]) {
        const framed = { ...knot, framings: [f] };
        const sketch = cableSketch(framed, 0, r);
        expect(sketch).not.toBeNull();
        const a = analyse(sketch!);
        const read = a.diagram!.diagram;
        // r^2 crossings per crossing of the companion plus |framing - writhe| full twists of
        // r(r-1) crossings each (the construction: common practice).
        expect(read.pd.length).toBe(r * r * knot.pd.length + Math.abs(f - writhe) * r * (r - 1));
        expect(read.pd.length).toBe(cable(framed, 0, r, 0).pd.length);
        // Any two copies link f times: a framing is the linking number with a pushoff (common practice).
        const lk = linkingMatrix(read);
        for (let i = 0; i < r; i++) for (let j = 0; j < r; j++) if (i !== j) expect(lk[i][j]).toBe(f);
        expect(linkDeterminant(read)).toBe(linkDeterminant(cable(framed, 0, r, 0)));
        // Parallel: most points of one copy lie one offset (18 px) from the next copy.
        const [p, q] = a.paths;
        const gaps = p.points.map((x) => Math.min(...q.points.map((y) => dist(x, y)))).sort((s, t) => s - t);
        const median = gaps[gaps.length >> 1];
        expect(median).toBeGreaterThan(14);
        expect(median).toBeLessThan(40);
      }
    }
  }
});

test('a cable of one component of a link keeps the other component', () => {
  const hopf = torusLink(2, 2);
  const sketch = cableSketch({ ...hopf, framings: [0, null] }, 0, 2);
  expect(sketch).not.toBeNull();
  const a = analyse(sketch!);
  sameLink(a, cable({ ...hopf, framings: [0, null] }, 0, 2, 0));
});

const laidOut = (d: Diagram): Picture => ({ ...layoutPD(d.pd, d.unknots), framings: d.framings });

test('connected sums: the summands side by side, their crossings apart', () => {
  const pretzel = { ...pretzelPicture([-2, 3, 7]), framings: [null] };
  const cases: [Picture, Picture, Diagram, Diagram][] = [
    [laidOut(trefoil), laidOut(figureEight), trefoil, figureEight],
    [laidOut(trefoil), laidOut(mirror(trefoil)), trefoil, mirror(trefoil)],
    [laidOut(figureEight), pretzel, figureEight, pretzelLink([-2, 3, 7])],
    [laidOut(twistKnot(3)), laidOut(torusLink(2, 5)), twistKnot(3), torusLink(2, 5)],
    [laidOut(torusLink(2, 2)), laidOut(trefoil), torusLink(2, 2), trefoil],
    // The drawing on the Slate as the first summand, as the Families builder passes it.
    [sketchPicture(pretzelSketch([-2, 3, 7])!)!, laidOut(trefoil), pretzelLink([-2, 3, 7]), trefoil],
    // A torus knot joining as its closed braid, as the Families builder passes it.
    [laidOut(figureEight), sketchPicture(closedBraidSketch([1, 1, 1, 1, 1])!)!, figureEight, fromBraid([1, 1, 1, 1, 1])],
  ];
  for (const [left, right, d1, d2] of cases) {
    const target = connectedSum(d1, d2);
    const sketch = sumSketch(left, right, target);
    expect(sketch).not.toBeNull();
    const a = analyse(sketch!);
    sameLink(a, target);
    // Side by side: a vertical line has the first summand's crossings on its left, the second's on its right.
    const xs = a.crossings.map((c) => c.at.x).sort((p, q) => p - q);
    expect(xs[d2.pd.length === 0 ? xs.length - 1 : d1.pd.length] - xs[d1.pd.length - 1]).toBeGreaterThan(30);
  }
});
