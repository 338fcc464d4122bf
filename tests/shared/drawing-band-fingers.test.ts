// Two band surfaces on one knot drawing compared where each class is carried down its own
// fingers (components/readout/local-compare.ts, shared/drawing/band-fingers.ts): a band drawn
// along another route has another finger, so its presentation's code differs from the first
// band's, and only the knot drawing without fingers is common to both.
import { compareSketches } from '@/components/readout/local-compare';
import { analyse } from '@/shared/drawing/analyse';
import { fingersOf } from '@/shared/drawing/band-fingers';
import { readBands } from '@/shared/drawing/band-read';
import { bandShapes } from '@/shared/drawing/band-shape';
import { addBand } from '@/shared/drawing/bands';
import { Point } from '@/shared/drawing/point';
import { moveComponent, Sketch } from '@/shared/drawing/sketch';
import { layoutPD, layoutToSketch } from '@/shared/layout';
import { p33m3 } from './bands-fixtures';
import { segment } from './drawing-fixtures';

// 9_46 = P(3,3,-3) as the Slate lays out a pasted code, scaled up (points three times as dense,
// the crossing flips moved along) so that a band has room to swing out; the same PD code.
const laid = layoutToSketch(layoutPD(p33m3.pd.map((x) => [...x]) as [number, number, number, number][], 0), []);
const K = 2.5;
const at = (x: number, y: number): Point => ({ x: K * x, y: K * y });
const denser = (ps: readonly Point[]) => ps.flatMap((p, i) => [0, 1, 2].map((k) => ({ x: p.x + ((ps[(i + 1) % ps.length].x - p.x) * k) / 3, y: p.y + ((ps[(i + 1) % ps.length].y - p.y) * k) / 3 })));
const strands: Sketch = {
  ...laid,
  flips: laid.flips.map((f) => ({ ...f, at: at(f.at.x, f.at.y) })),
  components: laid.components.map((c) => ({ ...c, points: denser(c.points.map((p) => at(p.x, p.y))) })),
};

function withCore(points: Point[]): Sketch {
  const r = addBand(strands, points);
  if ('reason' in r) throw new Error(r.reason);
  return r.sketch;
}

// The two ribbon disks of tests/browser/slate-946.spec.ts, scaled (disk A across a bigon of one
// +3 column, disk B a chord found by search with a different class).
const diskA = withCore(segment(at(166.28, -41.0), at(190.48, 21.11)));
const [b0, b1] = [at(237.36, 111.06), at(249.28, 45.89)];
const diskB = withCore(segment(b0, b1));
// Disk B's band leaving and reaching its strands as before, its core swung out along a curve
// (control point found by search) so that its finger passes over a strand and back: an R2 of
// the finger over that strand, two more crossings of the finger code (drawn by program).
const unit = { x: (b1.x - b0.x) / Math.hypot(b1.x - b0.x, b1.y - b0.y), y: (b1.y - b0.y) / Math.hypot(b1.x - b0.x, b1.y - b0.y) };
const [lead, tail] = [{ x: b0.x + 40 * unit.x, y: b0.y + 40 * unit.y }, { x: b1.x - 40 * unit.x, y: b1.y - 40 * unit.y }];
const control = { x: 500, y: 175 };
const swing = Array.from({ length: 61 }, (_, i) => {
  const t = i / 60;
  return { x: (1 - t) ** 2 * lead.x + 2 * t * (1 - t) * control.x + t * t * tail.x, y: (1 - t) ** 2 * lead.y + 2 * t * (1 - t) * control.y + t * t * tail.y };
});
const detourB = withCore([...segment(b0, lead, 6), ...swing.slice(1), ...segment(tail, b1, 6).slice(1)]);

const crossings = (s: Sketch) => {
  const r = readBands(s);
  if (!r || 'reason' in r) throw new Error(r ? r.reason : 'unread');
  const f = fingersOf(analyse(s), r);
  if ('reason' in f) throw new Error(f.reason);
  return { code: r.presentation.pd.length, fingers: f.of.filter((i) => i < 0).length };
};

describe('bands with fingers of their own, compared on the knot drawing', () => {
  test('swung out, the band crosses no strand but its finger passes one: two more crossings, all of them fingers', () => {
    expect(crossings(diskB)).toEqual({ code: 11, fingers: 2 });
    expect(crossings(detourB)).toEqual({ code: 13, fingers: 4 });
    expect(bandShapes(detourB)[0]).toMatchObject({ crossings: [] });
  });

  test('the same band drawn straight and swung out: the same class on the knot drawing', () => {
    // The band lies over the strands, so swinging it out over them, its ends kept, is an isotopy
    // of the surface rel boundary: the classes must be equal, coefficient for coefficient.
    const r = compareSketches({ a: diskB, b: detourB });
    if (r.kind !== 'compared') throw new Error(JSON.stringify(r));
    expect(r).toMatchObject({ on: 'knot', verdict: 'equal: no conclusion', a: { q: 1, zero: false } });
    expect(r.b.support).toEqual(r.a.support);
  });

  test("9_46's two disks still differ on the knot drawing, disk B swung out too", () => {
    // Sundberg and Swann, "Relative Khovanov-Jacobsson classes", 2021, arXiv 2103.01438.
    expect(compareSketches({ a: diskA, b: diskB })).toMatchObject({ kind: 'compared', on: 'knot', verdict: 'differ' });
    expect(compareSketches({ a: detourB, b: diskA })).toMatchObject({ kind: 'compared', on: 'knot', verdict: 'differ' });
  });

  test('the scaled drawing is the laid-out one, crossing for crossing', () => {
    expect(analyse(strands).diagram?.diagram.pd).toEqual(analyse(laid).diagram?.diagram.pd);
  });

  test('a knot drawing moved without changing its diagram is the same drawing; another diagram is not', () => {
    const moved = (s: Sketch) => s.components.reduce((t, c) => moveComponent(t, c.id, { x: 3, y: -2 }), s);
    expect(compareSketches({ a: diskA, b: moved(diskB) })).toMatchObject({ kind: 'compared', verdict: 'differ' });
    // Its mirror image: another diagram (of the mirror knot).
    const flip = (p: Point): Point => ({ x: -p.x, y: p.y });
    const mirror: Sketch = { ...strands, flips: strands.flips.map((f) => ({ ...f, at: flip(f.at) })), components: strands.components.map((c) => ({ ...c, points: c.points.map(flip) })) };
    expect(analyse(mirror).diagram?.diagram.pd).not.toEqual(analyse(strands).diagram?.diagram.pd);
    expect(compareSketches({ a: diskA, b: mirror })).toEqual({ kind: 'not-same' });
  });
});
