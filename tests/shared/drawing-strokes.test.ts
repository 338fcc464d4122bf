// Smoothing, closing strokes, and the Sketch edits with undo/redo.

import { analyse } from '@/shared/drawing/analyse';
import { canRedo, canUndo, commit, historyOf, redo, undo } from '@/shared/drawing/history';
import { dist, Point } from '@/shared/drawing/point';
import {
  addStroke,
  deleteComponent,
  emptySketch,
  moveComponent,
  nearestPointIndex,
  reshapeComponent,
  reverseComponent,
  setFraming,
} from '@/shared/drawing/sketch';
import { chaikin, resample, smoothPath } from '@/shared/drawing/smooth';
import { circleCurve, touches } from './drawing-fixtures';

const arc = (from: number, to: number, cx = 200, cy = 200, r = 60, n = 120): Point[] =>
  Array.from({ length: n + 1 }, (_, i) => {
    const t = from + ((to - from) * i) / n;
    return { x: cx + r * Math.cos(t), y: cy - r * Math.sin(t) };
  });

describe('smoothing', () => {
  test('resampling gives even spacing and keeps both ends of an open stroke', () => {
    const raw = [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 30 }];
    const out = resample(raw, false, 2);
    expect(out[0]).toEqual(raw[0]);
    expect(out[out.length - 1]).toEqual(raw[2]);
    const gaps = out.slice(1).map((p, i) => dist(p, out[i]));
    // Even arc length: chords are 2 on straight pieces, a little shorter across the corner.
    for (const g of gaps) expect(g).toBeLessThanOrEqual(2 + 1e-9);
    for (const g of gaps) expect(g).toBeGreaterThan(2 / Math.SQRT2 - 1e-9);
    expect(out.length).toBe(21); // 40 px of polyline in steps of 2
  });

  test('Chaikin keeps the end points of an open polyline and cuts corners', () => {
    const raw = [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }];
    const out = chaikin(raw, false, 1);
    expect(out[0]).toEqual(raw[0]);
    expect(out[out.length - 1]).toEqual(raw[2]);
    expect(out).not.toContainEqual(raw[1]);
  });

  test('jitter is smoothed out: a noisy circle lies closer to the true circle', () => {
    const noisy = touches(circleCurve(200, 200, 60), 300, 1.5, 7);
    const smooth = smoothPath(noisy, false, 3);
    const mean = (ps: Point[]) => ps.reduce((m, p) => m + Math.abs(dist(p, { x: 200, y: 200 }) - 60), 0) / ps.length;
    expect(mean(smooth)).toBeLessThan(mean(noisy) / 2);
  });
});

describe('closing strokes', () => {
  test('a stroke ending near its own start closes into a component', () => {
    const s = addStroke(emptySketch, touches(circleCurve(200, 200, 60), 200));
    expect(s.components).toHaveLength(1);
    expect(s.components[0].closed).toBe(true);
    const a = analyse(s);
    expect(a.diagram?.diagram).toEqual({ pd: [], unknots: 1, framings: [null] });
  });

  test('a stroke ending far from its start stays open and is not counted', () => {
    const s = addStroke(emptySketch, arc(0, Math.PI));
    expect(s.components[0].closed).toBe(false);
    const a = analyse(s);
    expect(a.open).toEqual([s.components[0].id]);
    expect(a.diagram).toBeNull();
  });

  test('a stroke continuing from the end of an open strand extends it, and closes it', () => {
    const first = addStroke(emptySketch, arc(0, Math.PI));
    const continued = addStroke(first, arc(Math.PI, 2 * Math.PI));
    expect(continued.components).toHaveLength(1);
    expect(continued.components[0].closed).toBe(true);
    expect(continued.components[0].id).toBe(first.components[0].id);
  });

  test('a stroke ending at the start of an open strand joins it; a third stroke closes both', () => {
    const first = addStroke(emptySketch, arc(0, Math.PI / 2));
    const joined = addStroke(first, arc(-Math.PI / 2, 0));
    expect(joined.components).toHaveLength(1);
    const path = joined.components[0];
    expect(path.closed).toBe(false);
    expect(dist(path.points[0], { x: 200, y: 260 })).toBeLessThan(1e-6); // angle -pi/2 (y down)
    expect(dist(path.points[path.points.length - 1], { x: 200, y: 140 })).toBeLessThan(1e-6);
    const closed = addStroke(joined, arc(Math.PI / 2, (3 * Math.PI) / 2));
    expect(closed.components).toHaveLength(1);
    expect(closed.components[0].closed).toBe(true);
  });

  test('a tap (one point) changes nothing', () => {
    expect(addStroke(emptySketch, [{ x: 1, y: 1 }])).toBe(emptySketch);
  });

  test('a stroke only starting near an open strand\'s start does not join it', () => {
    const s = addStroke(addStroke(emptySketch, arc(0, 1)), arc(-0.05, -1.5, 200, 200, 60));
    expect(s.components).toHaveLength(2);
  });
});

describe('edits', () => {
  const two = [circleCurve(200, 200, 50), circleCurve(260, 200, 50)].reduce((s, c, i) => addStroke(s, touches(c, 300, 0.5, i + 1)), emptySketch);

  test('moving a component apart removes its crossings; moving it back restores them', () => {
    expect(analyse(two).crossings).toHaveLength(2);
    const id = two.components[1].id;
    const away = moveComponent(two, id, { x: 300, y: 0 });
    expect(analyse(away).crossings).toHaveLength(0);
    expect(analyse(away).diagram?.diagram.unknots).toBe(2);
    expect(analyse(moveComponent(away, id, { x: -300, y: 0 })).diagram?.diagram.pd).toEqual(analyse(two).diagram?.diagram.pd);
  });

  test('reshaping: dragging a piece of one circle out of the other removes both crossings', () => {
    const b = two.components[1];
    const i = nearestPointIndex(b, { x: 210, y: 200 });
    const dragged = reshapeComponent(two, b.id, i, { x: 120, y: 0 }, 150);
    expect(analyse(dragged).crossings).toHaveLength(0);
    expect(Math.min(...dragged.components[1].points.map((p) => dist(p, { x: 330, y: 200 })))).toBeLessThan(3);
  });

  test('delete, framing and reverse are pure edits', () => {
    const id = two.components[0].id;
    expect(deleteComponent(two, id).components.map((c) => c.id)).toEqual([two.components[1].id]);
    const framed = setFraming(two, id, -2);
    expect(framed.components[0].framing).toBe(-2);
    expect(two.components[0].framing).toBeNull();
    expect(() => setFraming(two, id, 1.5)).toThrow(RangeError);
    const reversed = reverseComponent(two, id);
    expect(reversed.components[0].reversed).toBe(true);
    expect(reverseComponent(reversed, id).components[0].reversed).toBe(false);
  });

  test('undo and redo walk through the edits', () => {
    let h = historyOf(emptySketch);
    expect(canUndo(h)).toBe(false);
    h = commit(h, two);
    h = commit(h, deleteComponent(two, two.components[0].id));
    expect(h.present.components).toHaveLength(1);
    h = undo(h);
    expect(h.present).toBe(two);
    expect(canRedo(h)).toBe(true);
    h = redo(h);
    expect(h.present.components).toHaveLength(1);
    h = undo(undo(h));
    expect(h.present).toBe(emptySketch);
    expect(undo(h)).toBe(h);
    h = commit(redo(h), emptySketch);
    expect(canRedo(h)).toBe(false);
  });
});
