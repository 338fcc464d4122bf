// Bands follow a reshaped or moved strand (shared/drawing/band-carry.ts): their ends stay on the
// strand at the same fraction of its length, their over/under is kept, and a band that cannot
// follow is removed with the reason, never left attached somewhere else.

import { carryBands } from '@/shared/drawing/band-carry';
import { bandShapes } from '@/shared/drawing/band-shape';
import { bandsOf, flipBandCrossing } from '@/shared/drawing/bands';
import { readBands } from '@/shared/drawing/band-read';
import { dist, Point } from '@/shared/drawing/point';
import { addStroke, emptySketch, moveComponent, nearestPointIndex, reshapeComponent, Sketch, SketchComponent } from '@/shared/drawing/sketch';
import { bandFrom as band, circleCurve, tallEllipse as ellipse, touches } from './drawing-fixtures';


const unknot = addStroke(emptySketch, touches(ellipse, 400, 0.5, 1));
const across = band(unknot, { x: 112, y: 200 }, { x: 288, y: 200 });
const strand = (s: Sketch) => s.components[0];
const onStrand = (c: SketchComponent, p: Point) => dist(c.points[nearestPointIndex(c, p)], p);
const fraction = (c: SketchComponent, p: Point) => nearestPointIndex(c, p) / c.points.length;
// The reading of the bands as the band mathematics takes it: components after the band moves.
const afterComponents = (s: Sketch) => {
  const r = readBands(s);
  if (!r || 'reason' in r) throw new Error(r ? r.reason : 'no bands');
  return r.afterDiagram.components;
};

describe('a band on a reshaped strand', () => {
  const left = nearestPointIndex(strand(across), { x: 110, y: 200 });
  const reshaped = reshapeComponent(across, strand(across).id, left, { x: -30, y: 10 }, 60);
  const carried = carryBands(across, reshaped);

  test('its end stays on the strand, at the same fraction of its length', () => {
    expect(carried.notice).toBeNull();
    const [b] = bandsOf(carried.sketch);
    const c = strand(carried.sketch);
    expect(onStrand(c, b.core[0])).toBe(0);
    expect(onStrand(c, b.core[b.core.length - 1])).toBe(0);
    const [was] = bandsOf(across);
    // One point of the resampled path is one spacing: the fraction holds to about 1/n.
    expect(Math.abs(fraction(c, b.core[0]) - fraction(strand(across), was.core[0]))).toBeLessThanOrEqual(1.5 / c.points.length);
    // The end moved with the strand (by about the drag), the far end did not move.
    expect(dist(b.core[0], was.core[0])).toBeGreaterThan(20);
    expect(dist(b.core[b.core.length - 1], was.core[was.core.length - 1])).toBeLessThan(2);
  });

  test('it still splits the unknot in two, and has a shape', () => {
    expect(bandShapes(carried.sketch).every((s) => !('reason' in s))).toBe(true);
    expect(afterComponents(carried.sketch)).toBe(2);
  });

  test('without the carry the band would no longer touch its strand', () => {
    // The reason for carrying: the stored core end is left where the strand was.
    const [b] = bandsOf(reshaped);
    expect(onStrand(strand(reshaped), b.core[0])).toBeGreaterThan(20);
  });
});

describe('a moved strand takes its bands along', () => {
  test('a band with both ends on the moved strand moves with it', () => {
    const delta = { x: 37, y: -12 };
    const carried = carryBands(across, moveComponent(across, strand(across).id, delta));
    expect(carried.notice).toBeNull();
    const [was] = bandsOf(across);
    const [b] = bandsOf(carried.sketch);
    b.core.forEach((p, i) => expect(dist(p, { x: was.core[i].x + delta.x, y: was.core[i].y + delta.y })).toBeLessThan(1e-9));
  });
});

describe('over and under across other strands', () => {
  // A circle inside the ellipse, under the band across it; then the band set to pass under it.
  const inner = addStroke(unknot, touches(circleCurve(200, 200, 30), 200, 0.5, 2));
  const over = band(inner, { x: 112, y: 200 }, { x: 288, y: 200 });
  const [b] = bandsOf(over);
  const crossings = (s: Sketch) => {
    const [shape] = bandShapes(s);
    if ('reason' in shape) throw new Error(shape.reason);
    return shape.crossings;
  };
  const under = crossings(over).reduce((s, c) => flipBandCrossing(s, b.id, c.component, c.at), over);

  test('a small reshape keeps the band under the circle at both crossings', () => {
    const left = nearestPointIndex(strand(under), { x: 110, y: 200 });
    const carried = carryBands(under, reshapeComponent(under, strand(under).id, left, { x: -25, y: 0 }, 60));
    expect(crossings(under).every((c) => c.under)).toBe(true);
    expect(carried.notice).toBeNull();
    const now = crossings(carried.sketch);
    expect(now).toHaveLength(2);
    expect(now.every((c) => c.under)).toBe(true);
  });

  test('the circle reshaped off the band: removed, with the reason', () => {
    const circle = under.components[1];
    const top = nearestPointIndex(circle, { x: 200, y: 170 });
    // The top of the circle dragged down through the band's core: the core now meets the circle
    // once more or less, so its over/under cannot be carried.
    const reshaped = reshapeComponent(under, circle.id, top, { x: 0, y: 50 }, 40);
    const carried = carryBands(under, reshaped);
    expect(bandsOf(carried.sketch)).toHaveLength(0);
    expect(carried.notice).toMatch(/A band was removed by the edit \(undo brings it back\): Band 1 crosses the strands differently now/);
  });

  test('a band dragged too short is removed with its reason', () => {
    const right = nearestPointIndex(strand(across), { x: 290, y: 200 });
    const carried = carryBands(across, reshapeComponent(across, strand(across).id, right, { x: -150, y: 0 }, 40));
    expect(bandsOf(carried.sketch)).toHaveLength(0);
    expect(carried.notice).toMatch(/removed by the edit \(undo brings it back\): Band 1 is too short/);
  });
});
