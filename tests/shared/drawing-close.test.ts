// Closing strokes as a finger draws them (quick strokes with far-apart samples, overshoots),
// retraced strands, and the alternating / descending readings of a drawing.

import { alternate, alternatingFlips, isDescending } from '@/shared/drawing/alternate';
import { analyse, type Analysis } from '@/shared/drawing/analyse';
import { defaultOptions } from '@/shared/drawing/options';
import { dist, Point } from '@/shared/drawing/point';
import { addStroke, emptySketch, flipCrossing, Sketch } from '@/shared/drawing/sketch';
import { length } from '@/shared/drawing/smooth';
import { jones } from '@/shared/knot/jones';
import { Laurent } from '@/shared/poly/laurent';
import { circleCurve, drawCurves, figureEightCurve, touches, trefoilCurve } from './drawing-fixtures';

/** Samples of a closed curve at t = 2 pi i / n for i = 0 .. n (the last back at the start), shifted by `end` at the last one. */
const quick = (curve: (t: number) => Point, n: number, end: Point = { x: 0, y: 0 }): Point[] =>
  Array.from({ length: n + 1 }, (_, i) => {
    const p = curve((2 * Math.PI * i) / n);
    return i === n ? { x: p.x + end.x, y: p.y + end.y } : p;
  });

const only = (s: Sketch) => {
  expect(s.components).toHaveLength(1);
  return s.components[0];
};

describe('closing', () => {
  test('a quick 30-sample circle (31 px between samples) closes, its down point included', () => {
    const raw = quick(circleCurve(200, 200, 150), 30, { x: 6, y: -8 });
    expect(dist(raw[0], raw[1])).toBeGreaterThan(30);
    const c = only(addStroke(emptySketch, raw));
    expect(c.closed).toBe(true);
    expect(analyse({ ...emptySketch, components: [c], nextSeq: 2 }).diagram?.diagram).toEqual({ pd: [], unknots: 1, framings: [null] });
  });

  test('a quick 30-sample trefoil closes with its 3 crossings', () => {
    const a = analyse(addStroke(emptySketch, quick(trefoilCurve, 30, { x: -9, y: 5 })));
    expect(a.open).toEqual([]);
    expect(a.markers).toEqual([]);
    expect(a.crossings).toHaveLength(3);
  });

  test('the close radius is the option: a last sample 19 px short of the start closes, 21 px does not', () => {
    // The circle's own samples stop a quarter turn short; the last one is placed off the start.
    const arcTo = (gap: number) => [...quick(circleCurve(200, 200, 80), 60).slice(0, 46), { x: 280, y: 200 + gap }];
    expect(defaultOptions.closeRadius).toBe(20);
    expect(only(addStroke(emptySketch, arcTo(19))).closed).toBe(true);
    expect(only(addStroke(emptySketch, arcTo(21))).closed).toBe(false);
  });

  test('a last segment that passes the start within the radius closes, though both its ends are far', () => {
    // Fast and tangential: from 30 px before the start to 30 px after it, 10 px beside it.
    const raw = [...quick(circleCurve(200, 200, 100), 40).slice(0, 39), { x: 300 + 10, y: 230 }, { x: 300 + 10, y: 170 }];
    expect(only(addStroke(emptySketch, raw)).closed).toBe(true);
  });

  test('an overshoot of 80 px is trimmed: one closed circle, no crossing, its length a circle\'s', () => {
    const r = 80;
    const overshoot = 80 / r; // radians of run-on past the start
    const raw = Array.from({ length: 401 }, (_, i) => circleCurve(200, 200, r)((2 * Math.PI + overshoot) * i / 400));
    const s = addStroke(emptySketch, raw);
    const c = only(s);
    expect(c.closed).toBe(true);
    const a = analyse(s);
    expect(a.crossings).toHaveLength(0);
    expect(a.markers).toEqual([]);
    // Circumference 2 pi r (Euclid); smoothing shortens a polygon a little, never by 5 %.
    expect(Math.abs(length(c.points, true) - 2 * Math.PI * r) / (2 * Math.PI * r)).toBeLessThan(0.05);
  });

  test('running on beyond the overshoot reach leaves the strand open', () => {
    const r = 80;
    const raw = Array.from({ length: 401 }, (_, i) => circleCurve(200, 200, r)((2 * Math.PI + 160 / r) * i / 400));
    expect(only(addStroke(emptySketch, raw)).closed).toBe(false);
  });

  test('a short stroke that comes back to its start (a dash) is not closed', () => {
    expect(only(addStroke(emptySketch, quick(circleCurve(200, 200, 10), 20))).closed).toBe(false);
  });
});

describe('retraced strands', () => {
  // Two laps of a circle, the second `apart` px outside the first, then back to the start.
  const twice = (apart: number) =>
    Array.from({ length: 801 }, (_, i) => {
      const t = (4 * Math.PI * i) / 800;
      const r = 80 + (apart * t) / (4 * Math.PI);
      return { x: 200 + r * Math.cos(t), y: 200 - r * Math.sin(t) };
    });

  test.each([5, 8])('a circle traced twice (%i px apart) is marked, and no framing is read from it', (apart) => {
    const a = analyse(addStroke(emptySketch, twice(apart)));
    expect(a.markers.map((m) => m.kind)).toEqual(['retrace']);
    expect(a.diagram).toBeNull();
  });

  test('a kink drawn as a visible loop still reads as one crossing', () => {
    // The limacon r = 1 + 2 cos t has an inner loop with one double point (common practice).
    const limacon = (t: number) => ({ x: 200 + 40 * (1 + 2 * Math.cos(t)) * Math.cos(t), y: 200 - 40 * (1 + 2 * Math.cos(t)) * Math.sin(t) });
    const a = analyse(addStroke(emptySketch, touches(limacon, 400)));
    expect(a.markers).toEqual([]);
    expect(a.crossings).toHaveLength(1);
  });
});

describe('alternating and descending', () => {
  // Jones polynomials: Jones 1985 (Bull. AMS 12); positive trefoil as in docs/conventions.md.
  const trefoil = Laurent.fromPairs([[1, 1], [3, 1], [4, -1]]);
  const figureEight = Laurent.fromPairs([[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]);
  const hopf = Laurent.fromPairs([[0.5, -1], [2.5, -1]]);
  const mirror = (v: Laurent) => v.substitute(-1);
  const jonesOf = (s: Sketch) => jones(analyse(s).diagram!.diagram);

  /** Along every closed path, passages alternate over and under. */
  const alternates = (a: Analysis) =>
    a.paths.every((p) => {
      const passes = a.crossings.flatMap((c) => [...(c.over === p.id ? [{ arc: c.overArc, over: true }] : []), ...(c.under === p.id ? [{ arc: c.underArc, over: false }] : [])]);
      passes.sort((x, y) => x.arc - y.arc);
      return passes.every((x, k) => x.over !== passes[(k + 1) % passes.length].over);
    });

  test('curls drawn in one stroke are descending and already alternating, and no flip changes them', () => {
    // What the Slate's note says of such a drawing: a reduced alternating diagram with n > 0
    // crossings has bracket span 4n (Kauffman, Murasugi, Thistlethwaite 1987), so an alternating
    // diagram of the unknot has only nugatory crossings, and flipping one keeps the unknot: V = 1.
    const limacon = (t: number) => ({ x: 200 + 60 * (1 + 2 * Math.cos(t)) * Math.cos(t), y: 200 + 60 * (1 + 2 * Math.cos(t)) * Math.sin(t) });
    const lemniscate = (t: number) => ({ x: 200 + 120 * Math.sin(t + 1), y: 200 + 90 * Math.sin(t + 1) * Math.cos(t + 1) });
    for (const curve of [limacon, lemniscate]) {
      const drawn = addStroke(emptySketch, touches(curve, 400));
      const a = analyse(drawn);
      expect(a.crossings).toHaveLength(1);
      expect(isDescending(a)).toBe(true);
      expect(alternatingFlips(a)).toEqual([false]);
      expect(alternate(drawn).flips).toEqual(drawn.flips);
      const c = a.crossings[0];
      const flipped = flipCrossing(drawn, { a: c.over, b: c.under, at: c.at });
      expect(isDescending(analyse(flipped))).toBe(true);
      expect(jonesOf(flipped).equals(Laurent.one)).toBe(true);
    }
  });

  test('a trefoil drawn in one stroke is descending; Alternate makes it a trefoil', () => {
    const drawn = addStroke(emptySketch, touches(trefoilCurve, 400));
    expect(isDescending(analyse(drawn))).toBe(true);
    const s = alternate(drawn);
    const a = analyse(s);
    expect(alternates(a)).toBe(true);
    expect(isDescending(a)).toBe(false);
    expect([trefoil, mirror(trefoil)].some((v) => v.equals(jonesOf(s)))).toBe(true);
    // The fewer flips of the two choices: one of three crossings.
    expect(s.flips).toHaveLength(1);
  });

  test('Alternate on a figure-eight projection gives the figure-eight knot', () => {
    const s = alternate(addStroke(emptySketch, touches(figureEightCurve, 600)));
    expect(alternates(analyse(s))).toBe(true);
    expect(jonesOf(s).equals(figureEight)).toBe(true);
  });

  test('two overlapping circles drawn one after the other are descending; Alternate links them', () => {
    const drawn = drawCurves([circleCurve(200, 200, 50), circleCurve(260, 200, 50)]);
    expect(isDescending(analyse(drawn))).toBe(true);
    const s = alternate(drawn);
    expect(isDescending(analyse(s))).toBe(false);
    expect([hopf, mirror(hopf)].some((v) => v.equals(jonesOf(s)))).toBe(true);
  });

  test('torus-knot projections: after Alternate every component alternates; twice is once', () => {
    // The curve r = 2 + cos(q t), angle p t (p < q coprime) is the usual picture of T(p, q).
    for (const [p, q] of [[2, 3], [2, 5], [3, 4], [3, 5]]) {
      const curve = (t: number) => ({ x: 200 + 50 * (2 + Math.cos(q * t)) * Math.cos(p * t), y: 200 + 50 * (2 + Math.cos(q * t)) * Math.sin(p * t) });
      const s = alternate(addStroke(emptySketch, touches(curve, 1200, 0.3)));
      const a = analyse(s);
      expect(a.markers).toEqual([]);
      expect(alternates(a)).toBe(true);
      expect(alternate(s)).toEqual(s);
    }
  });

  test('a drawing with a marker or no crossing is neither changed nor descending', () => {
    const circle = drawCurves([circleCurve(200, 200, 50)]);
    expect(alternate(circle)).toBe(circle);
    expect(isDescending(analyse(circle))).toBe(false);
  });
});
