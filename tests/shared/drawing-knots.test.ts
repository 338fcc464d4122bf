// Knots and links drawn programmatically as parametric curves (sampled as noisy touch points):
// crossing count, PD code, orientation and the Jones polynomial from the knot core.

import { alternate } from '@/shared/drawing/alternate';
import { analyse } from '@/shared/drawing/analyse';
import { Point } from '@/shared/drawing/point';
import { carryFlips } from '@/shared/drawing/carry';
import { addStroke, emptySketch, flipCrossing, moveComponent, reshapeComponent, reverseComponent, setFraming, Sketch } from '@/shared/drawing/sketch';
import { toPD } from '@/shared/drawing/to-pd';
import { Diagram } from '@/shared/knot/diagram';
import { jones } from '@/shared/knot/jones';
import { orient, writhe } from '@/shared/knot/pd';
import { Laurent } from '@/shared/poly/laurent';
import { circleCurve, drawCurves, figureEightCurve, touches, trefoilCurve } from './drawing-fixtures';

const poly = (pairs: [number, number][]) => Laurent.fromPairs(pairs);
// Jones polynomials: Jones 1985 (Bull. AMS 12, "A polynomial invariant for knots via von
// Neumann algebras") and the tables in Lickorish, An Introduction to Knot Theory, ch. 3;
// the positive trefoil value is also fixed in docs/conventions.md.
const positiveTrefoil = poly([[1, 1], [3, 1], [4, -1]]);
const figureEight = poly([[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]);
const positiveHopf = poly([[0.5, -1], [2.5, -1]]);
const mirror = (v: Laurent) => v.substitute(-1);

const diagramOf = (s: Sketch): Diagram => {
  const a = analyse(s);
  expect(a.markers).toEqual([]);
  expect(a.diagram).not.toBeNull();
  return a.diagram!.diagram;
};

const flipAll = (s: Sketch): Sketch => analyse(s).crossings.reduce((acc, c) => flipCrossing(acc, { a: c.over, b: c.under, at: c.at }), s);

describe('knots drawn as curves', () => {
  test.each([1, 2, 3])('trefoil (seed %i): 3 crossings, Jones of a trefoil matching its writhe', (seed) => {
    const s = alternate(addStroke(emptySketch, touches(trefoilCurve, 400, 0.8, seed)));
    const d = diagramOf(s);
    expect(d.pd).toHaveLength(3);
    const w = writhe(orient(d.pd));
    expect(Math.abs(w)).toBe(3); // an alternating 3-crossing knot diagram: all signs equal
    expect(jones(d).equals(w > 0 ? positiveTrefoil : mirror(positiveTrefoil))).toBe(true);
    // Flipping every crossing gives the mirror image: V(t) -> V(1/t) (Jones 1985, Thm. on mirror images).
    expect(jones(diagramOf(flipAll(s))).equals(mirror(jones(d)))).toBe(true);
  });

  test('carryFlips: dragging a strand through a flipped crossing far keeps the knot', () => {
    const s = alternate(addStroke(emptySketch, touches(trefoilCurve, 400, 0.5, 5)));
    const before = analyse(s);
    const c = before.crossings.find((x) => x.flipped)!;
    // Drag the strand by 40 px (beyond the flip radius) across its direction: the crossing
    // slides along the other strand.
    const i = Math.round(c.overArc / (before.paths[0].length / s.components[0].points.length)); // the over passage
    const push = { x: -40 * c.overDirection.y, y: 40 * c.overDirection.x };
    const dragged = carryFlips(s, reshapeComponent(s, s.components[0].id, i, push, 120));
    const after = analyse(dragged);
    expect(after.crossings).toHaveLength(3);
    // The crossing did move beyond the flip radius (else this would test nothing).
    expect(Math.min(...after.crossings.map((x) => Math.hypot(x.at.x - c.at.x, x.at.y - c.at.y)))).toBeGreaterThan(24);
    expect(after.crossings.filter((x) => x.flipped)).toHaveLength(before.crossings.filter((x) => x.flipped).length);
    expect(jones(after.diagram!.diagram).equals(jones(before.diagram!.diagram))).toBe(true);
  });

  test('carryFlips: moving one circle of a Hopf link keeps it linked', () => {
    const s = drawCurves([circleCurve(200, 200, 50), circleCurve(260, 200, 50)], 400, 0.5);
    const bottom = analyse(s).crossings.find((c) => c.at.y > 200)!;
    const hopf = flipCrossing(s, { a: bottom.over, b: bottom.under, at: bottom.at });
    // Moving the right circle 35 px to the right slides both crossings 30 px along the left one.
    const moved = carryFlips(hopf, moveComponent(hopf, hopf.components[1].id, { x: 35, y: 0 }));
    expect(jones(diagramOf(moved)).equals(positiveHopf)).toBe(true);
  });

  test('a trefoil drawn in one stroke with the default rule is descending, hence an unknot', () => {
    // Later passage under everywhere: a descending diagram is a diagram of the unknot (common practice).
    const d = diagramOf(addStroke(emptySketch, touches(trefoilCurve, 400, 0.5, 4)));
    expect(d.pd).toHaveLength(3);
    expect(jones(d).equals(Laurent.one)).toBe(true);
  });

  test.each([1, 2])('figure-eight (seed %i): 4 crossings, amphichiral Jones', (seed) => {
    const s = alternate(addStroke(emptySketch, touches(figureEightCurve, 600, 0.8, seed)));
    const d = diagramOf(s);
    expect(d.pd).toHaveLength(4);
    expect(writhe(orient(d.pd))).toBe(0);
    expect(jones(d).equals(figureEight)).toBe(true);
    expect(jones(diagramOf(flipAll(s))).equals(figureEight)).toBe(true);
  });

  test('Hopf link: two counterclockwise circles, left over at the top and under at the bottom, is positive', () => {
    // Seen on screen, at the top crossing the left circle runs up-left over the right circle,
    // which runs down-left: by the right-hand rule (Lickorish ch. 1) that crossing is positive.
    const s = drawCurves([circleCurve(200, 200, 50), circleCurve(260, 200, 50)], 400, 0.8);
    const a = analyse(s);
    expect(a.crossings).toHaveLength(2);
    // Default: the later circle (the right one) passes under at both crossings: a split diagram.
    expect(a.crossings.every((c) => c.under === s.components[1].id)).toBe(true);
    const bottom = a.crossings.find((c) => c.at.y > 200)!;
    const hopf = flipCrossing(s, { a: bottom.over, b: bottom.under, at: bottom.at });
    const d = diagramOf(hopf);
    expect(orient(d.pd).signs).toEqual([1, 1]);
    expect(jones(d).equals(positiveHopf)).toBe(true);
    // Reversing one component negates the linking number: the negative Hopf link (Jones 1985).
    expect(jones(diagramOf(reverseComponent(hopf, hopf.components[0].id))).equals(mirror(positiveHopf))).toBe(true);
    // Flipping back gives the two-component unlink, V = -t^(1/2) - t^(-1/2) (Jones 1985).
    expect(jones(diagramOf(s)).equals(poly([[0.5, -1], [-0.5, -1]]))).toBe(true);
  });
});

describe('PD code from strokes', () => {
  test('screen orientation: the right-handed crossing as seen on screen (y down) reads X[a, b, c, d] with b the outgoing over-strand', () => {
    // Seen on screen: the under-strand runs from bottom right to top left, (-1, -1) in y-down
    // coordinates, the over-strand from bottom left to top right, (1, -1). That is the positive
    // crossing (right-hand rule, Lickorish ch. 1). Counterclockwise as seen from the incoming
    // under ray (pointing to the bottom right) comes the outgoing over ray (top right).
    // Two such crossings on two components make a positive Hopf link.
    const over = { path: 0, arc: 0, direction: { x: 1, y: -1 } };
    const under = { path: 1, arc: 0, direction: { x: -1, y: -1 } };
    const second = { over: { path: 1, arc: 5, direction: { x: 1, y: -1 } }, under: { path: 0, arc: 5, direction: { x: -1, y: -1 } } };
    const pd = toPD([{ over, under }, second], 2, [false, false]);
    // Labels along the travel: component 0 has 1 (crossing 1 to 2) and 2, component 1 has 3 and 4.
    expect(pd[0]).toEqual([4, 1, 3, 2]); // a = into under, b = out of over, c = out of under, d = into over
    expect(pd[1]).toEqual([1, 4, 2, 3]);
    expect(orient(pd).signs).toEqual([1, 1]);
  });

  test('framings follow the components into the diagram', () => {
    let s = drawCurves([circleCurve(200, 200, 50), circleCurve(260, 200, 50), circleCurve(500, 200, 40)]);
    s = setFraming(setFraming(s, s.components[1].id, 4), s.components[2].id, -1);
    const a = analyse(s);
    const d = a.diagram!;
    expect(d.diagram.unknots).toBe(1);
    d.componentIds.forEach((id, i) => expect(d.diagram.framings[i]).toBe(s.components.find((c) => c.id === id)!.framing));
  });

  test('components are oriented along the drawing direction, and reversible', () => {
    const s = alternate(addStroke(emptySketch, touches(trefoilCurve, 400, 0.5, 9)));
    const a = analyse(s);
    const travelled = (an: typeof a) => {
      const o = orient(an.diagram!.diagram.pd);
      // The crossing each edge enters, in the order orient() walks the component.
      return o.components[0].map((label) => o.head.get(label)!.crossing);
    };
    // Along the drawing, the passages come in increasing arc length (from either of their two).
    const passes = a.crossings
      .flatMap((c, i) => [{ i, arc: c.overArc }, { i, arc: c.underArc }])
      .sort((p, q) => p.arc - q.arc)
      .map((p) => p.i);
    const cyclic = (xs: number[], ys: number[]) => xs.some((_, k) => [...xs.slice(k), ...xs.slice(0, k)].join() === ys.join());
    expect(cyclic(travelled(a), passes)).toBe(true);
    const back = analyse(reverseComponent(s, s.components[0].id));
    expect(cyclic(travelled(back), [...passes].reverse())).toBe(true);
    // Reversing a knot changes no crossing sign (common practice).
    expect(back.crossings.map((c) => c.sign)).toEqual(a.crossings.map((c) => c.sign));
  });

  test('crossingless closed components are unknots with their framings; open strands are ignored', () => {
    const s = drawCurves([circleCurve(100, 100, 40), circleCurve(300, 100, 40)]);
    const withOpen = addStroke(s, [{ x: 0, y: 300 }, { x: 100, y: 310 }, { x: 200, y: 300 }]);
    const a = analyse(withOpen);
    expect(a.open).toHaveLength(1);
    expect(a.diagram?.diagram).toEqual({ pd: [], unknots: 2, framings: [null, null] });
    expect(a.diagram?.componentIds).toEqual([s.components[0].id, s.components[1].id]);
  });

  test('an over-only component of two edges is read back in its drawing direction', () => {
    // Circle 2 passes over circle 1 twice (flip both): its two labels read "increasing" both
    // ways, the case orient() resolves by crossing order.
    for (const reversed of [false, true]) {
      let s = drawCurves([circleCurve(200, 200, 50), circleCurve(260, 200, 50)], 400, 0.3);
      if (reversed) s = reverseComponent(s, s.components[1].id);
      s = flipAll(s);
      const a = analyse(s);
      // orient() must read the drawn directions: its signs equal those of the drawn crossings.
      expect(orient(a.diagram!.diagram.pd).signs).toEqual(a.crossings.map((c) => c.sign));
      // One circle over the other at both crossings: linking number 0, signs +1 and -1.
      expect([...a.crossings.map((c) => c.sign)].sort()).toEqual([-1, 1]);
    }
  });
});

describe('degenerate drawings give markers and no diagram', () => {
  const markersOf = (s: Sketch) => {
    const a = analyse(s);
    expect(a.diagram).toBeNull();
    return a.markers;
  };
  const near = (p: Point, q: Point, r: number) => Math.hypot(p.x - q.x, p.y - q.y) < r;

  test('two circles touching (tangent) or nearly touching', () => {
    for (const gap of [0, 1.5]) {
      const m = markersOf(drawCurves([circleCurve(200, 200, 50), circleCurve(300 + gap, 200, 50)], 400, 0));
      expect(m.length).toBeGreaterThan(0);
      expect(m.every((x) => x.kind === 'touch' || x.kind === 'tangle')).toBe(true);
      expect(near(m[0].at, { x: 250, y: 200 }, 8)).toBe(true);
      expect(m[0].message.length).toBeGreaterThan(10);
    }
  });

  test('three strands through one point', () => {
    const p = { x: 200, y: 200 };
    const circles = [0, 1, 2].map((k) => circleCurve(p.x + 60 * Math.cos((2 * Math.PI * k) / 3 + 0.3), p.y + 60 * Math.sin((2 * Math.PI * k) / 3 + 0.3), 60));
    const m = markersOf(drawCurves(circles, 500, 0.2));
    expect(m.some((x) => x.kind === 'triple-point' && near(x.at, p, 6))).toBe(true);
  });

  test('a stroke retracing itself', () => {
    // Out along a line and back 1 px beside it: a closed stroke that runs along itself.
    const out = Array.from({ length: 60 }, (_, i) => ({ x: 100 + 4 * i, y: 200 }));
    const back = out.map((q) => ({ x: q.x, y: 201 })).reverse();
    const m = markersOf(addStroke(emptySketch, [...out, ...back]));
    expect(m.some((x) => x.kind === 'overlap')).toBe(true);
  });

  test('two crossings too close together', () => {
    // Circles of radius 50 with centres 99.6 apart cross at (249.8, +-3.2): 6.3 px apart.
    const m = markersOf(drawCurves([circleCurve(200, 200, 50), circleCurve(299.6, 200, 50)], 600, 0));
    expect(m.length).toBeGreaterThan(0);
    expect(m.every((x) => near(x.at, { x: 249.8, y: 200 }, 8))).toBe(true);
  });

  test('moving a component away from a degeneracy brings the diagram back', () => {
    const s = drawCurves([circleCurve(200, 200, 50), circleCurve(300, 200, 50)], 400, 0);
    expect(analyse(s).diagram).toBeNull();
    const d = analyse({ ...s, components: [s.components[0], { ...s.components[1], points: s.components[1].points.map((q) => ({ x: q.x + 40, y: q.y })) }] });
    expect(d.diagram?.diagram.unknots).toBe(2);
  });
});
