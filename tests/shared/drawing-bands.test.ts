// Bands on drawings: the finger-moved drawing is the same link (a finger move is an isotopy),
// and the drawing after the band moves is what band surgery gives on standard examples.

import { addBand, setBandTwists, flipBandCrossing, bandsOf } from '@/shared/drawing/bands';
import { readBands, BandDrawings } from '@/shared/drawing/band-read';
import { analyse } from '@/shared/drawing/analyse';
import { toSVG, toTikZ } from '@/shared/drawing/export';
import { SlateGeometry } from '@/shared/api/sketches';
import { Point } from '@/shared/drawing/point';
import { addStroke, emptySketch, reverseComponent, Sketch } from '@/shared/drawing/sketch';
import { afterBands, bandCertificate } from '@/shared/knot/bands';
import { Diagram } from '@/shared/knot/diagram';
import { jones } from '@/shared/knot/jones';
import { Laurent } from '@/shared/poly/laurent';
import { circleCurve, touches } from './drawing-fixtures';

// Jones polynomials (common practice): the c-component unlink has (-t^{1/2} - t^{-1/2})^(c-1);
// the Hopf links -t^{1/2} - t^{5/2} and its mirror (Jones 1985, Bull. AMS 12; Lickorish, An
// Introduction to Knot Theory, ch. 3).
const loop = Laurent.fromPairs([[-0.5, -1], [0.5, -1]]);
const unlink = (c: number) => Array.from({ length: c - 1 }, () => loop).reduce((p, q) => p.mul(q), Laurent.fromPairs([[0, 1]]));
const hopf = Laurent.fromPairs([[0.5, -1], [2.5, -1]]);

const ellipse = (cx: number, cy: number, rx: number, ry: number) => (t: number): Point => ({ x: cx + rx * Math.cos(t), y: cy - ry * Math.sin(t) });
const line = (p: Point, q: Point, n = 40): Point[] => Array.from({ length: n + 1 }, (_, i) => ({ x: p.x + ((q.x - p.x) * i) / n, y: p.y + ((q.y - p.y) * i) / n }));

const drawn = (curves: ((t: number) => Point)[]): Sketch => curves.reduce((s, c, i) => addStroke(s, touches(c, 400, 0.5, i + 1)), emptySketch);
const band = (s: Sketch, p: Point, q: Point): Sketch => {
  const r = addBand(s, line(p, q));
  if ('reason' in r) throw new Error(r.reason);
  return r.sketch;
};
const jonesOf = (d: { pd: Diagram['pd']; unknots: number }) => jones({ pd: d.pd, unknots: d.unknots, framings: [] });
// Every reading is checked against the band mathematics: the saddles applied to the finger
// drawing's PD code give the same link as the drawing after the band moves (same Jones).
const read = (s: Sketch): BandDrawings => {
  const r = readBands(s);
  if (!r || 'reason' in r) throw new Error(r ? r.reason : 'no bands');
  const pd = { ...r.presentation, saddles: [...r.presentation.saddles] };
  expect(jonesOf(afterBands(pd)).equals(jonesOf(r.afterDiagram))).toBe(true);
  return r;
};
const original = (s: Sketch) => jonesOf(analyse(s).diagram!.diagram);

describe('bands on a drawn unknot', () => {
  const unknot = drawn([ellipse(200, 200, 90, 140)]);
  const across = band(unknot, { x: 112, y: 200 }, { x: 288, y: 200 });

  test('a band between two antiparallel strands splits it into the 2-component unlink', () => {
    const r = read(across);
    expect(r.afterDiagram.components).toBe(2);
    expect(jonesOf(r.afterDiagram).equals(unlink(2))).toBe(true);
    // The finger move is an isotopy: still the unknot, one saddle on two distinct edges.
    expect(jonesOf(r.presentation).equals(unlink(1))).toBe(true);
    // One band to the 2-component unlink: c = b + 1, a ribbon disk (Euler characteristic c - b).
    expect(bandCertificate({ ...r.presentation, saddles: [...r.presentation.saddles] })).toMatchObject({ components: 2, chi: 1, ribbon: true });
    expect(r.presentation.saddles).toHaveLength(1);
    const { a, b } = r.presentation.saddles[0];
    expect(a).not.toBe(b);
    const labels = new Set(r.presentation.pd.flat());
    expect(labels.has(a) && labels.has(b)).toBe(true);
  });

  test('a short untwisted band needs no room for twists', () => {
    // Across a narrow ellipse: long enough to leave its strands, too short to hold a half twist.
    const narrow = drawn([ellipse(200, 200, 30, 140)]);
    const r = read(band(narrow, { x: 171, y: 200 }, { x: 229, y: 200 }));
    expect(r.afterDiagram.components).toBe(2);
    expect(jonesOf(r.afterDiagram).equals(unlink(2))).toBe(true);
  });

  test('one half twist would make a Moebius band: refused with the reason', () => {
    const r = readBands(setBandTwists(across, bandsOf(across)[0].id, 1));
    expect(r && 'reason' in r && r.reason).toMatch(/non-orientable/);
  });

  test('a full twist gives a Hopf link, mirrored with the twist', () => {
    const id = bandsOf(across)[0].id;
    const plus = read(setBandTwists(across, id, 2));
    const minus = read(setBandTwists(across, id, -2));
    const vp = jonesOf(plus.afterDiagram);
    const vm = jonesOf(minus.afterDiagram);
    expect(vp.equals(hopf) || vp.equals(hopf.substitute(-1))).toBe(true);
    expect(vm.equals(vp.substitute(-1))).toBe(true);
    expect(jonesOf(plus.presentation).equals(unlink(1))).toBe(true);
  });
});

describe('a band joining two circles', () => {
  const two = drawn([circleCurve(120, 200, 60), circleCurve(320, 200, 60)]);

  test('joins the 2-component unlink into the unknot', () => {
    const r = read(band(two, { x: 180, y: 200 }, { x: 260, y: 200 }));
    expect(r.afterDiagram.components).toBe(1);
    expect(jonesOf(r.afterDiagram).equals(unlink(1))).toBe(true);
    expect(jonesOf(r.presentation).equals(unlink(2))).toBe(true);
  });

  test('with one circle reversed the flat band is refused, and a half twist makes it orientable', () => {
    const apart = drawn([circleCurve(100, 200, 50), circleCurve(340, 200, 50)]);
    const flipped = band(reverseComponent(apart, apart.components[1].id), { x: 150, y: 200 }, { x: 290, y: 200 });
    expect(readBands(flipped)).toEqual({ reason: expect.stringMatching(/non-orientable/) });
    const r = read(setBandTwists(flipped, bandsOf(flipped)[0].id, 1));
    expect(jonesOf(r.afterDiagram).equals(unlink(1))).toBe(true);
    // The one crossing after the move is the twist. Its sides, oriented along the core, make a
    // positive crossing for a positive half twist (docs/conventions.md, Bands); the orientable
    // band's sides run opposite ways, so the after drawing reads it negative.
    expect(r.after.crossings.map((c) => c.sign)).toEqual([-1]);
    const m = read(setBandTwists(flipped, bandsOf(flipped)[0].id, -1));
    expect(m.after.crossings.map((c) => c.sign)).toEqual([1]);
  });
});

describe('a band across another strand', () => {
  // An ellipse with a small circle inside; the band crosses the circle twice.
  const s = band(drawn([ellipse(200, 200, 150, 110), circleCurve(200, 200, 40)]), { x: 52, y: 200 }, { x: 348, y: 200 });

  test('the finger drawing is the same link whichever way the band passes', () => {
    const b = bandsOf(s)[0];
    const r = read(s);
    expect(jonesOf(r.presentation).equals(original(s))).toBe(true);
    // Passing over both times: the small circle stays split off, a 3-component unlink.
    expect(jonesOf(r.afterDiagram).equals(unlink(3))).toBe(true);
    const under = flipBandCrossing(s, b.id, s.components[1].id, { x: 160, y: 200 });
    const u = read(under);
    expect(jonesOf(u.presentation).equals(original(s))).toBe(true);
    expect(jonesOf(u.afterDiagram).equals(unlink(3))).toBe(false);
  });
});

describe('two bands whose cores cross', () => {
  test('the finger drawing is still the unknot and agrees with the band mathematics', () => {
    const e = ellipse(200, 200, 90, 140);
    const at = (y: number, side: 1 | -1) => ({ x: 200 + side * 90 * Math.sqrt(1 - ((y - 200) / 140) ** 2), y });
    const s = band(band(drawn([e]), at(130, -1), at(270, 1)), at(270, -1), at(130, 1));
    const r = read(s);
    expect(jonesOf(r.presentation).equals(unlink(1))).toBe(true);
    expect(r.presentation.saddles).toHaveLength(2);
    // The cores cross, so the fingers' sides cross four times (plus the two R2s at their tips);
    // each band changes the number of components by one (common practice): 1 or 3 after two.
    expect(r.presentation.pd.length).toBeGreaterThanOrEqual(4);
    expect([1, 3]).toContain(r.afterDiagram.components);
  });
});

describe('bands saved and exported', () => {
  const s = band(drawn([ellipse(200, 200, 90, 140)]), { x: 112, y: 200 }, { x: 288, y: 200 });

  test('the stored geometry keeps bands, and a drawing saved before bands still reads', () => {
    const stored = JSON.parse(JSON.stringify({ ...s, colours: {} }));
    const parsed = SlateGeometry.parse(stored);
    expect(parsed.bands).toEqual(bandsOf(s));
    const { bands: _, ...old } = stored;
    expect(SlateGeometry.safeParse(old).success).toBe(true);
    expect(readBands({ ...SlateGeometry.parse(old) })).toBeNull();
  });

  test('SVG and TikZ draw each band as a ribbon over the strands', () => {
    const a = analyse(s);
    const cores = bandsOf(s).map((b) => b.core);
    expect(toSVG(a, { bands: cores }).match(/stroke-opacity="0.4" stroke-width="16"/g)).toHaveLength(1);
    expect(toSVG(a)).not.toMatch(/stroke-opacity/);
    expect(toTikZ(a, { bands: cores }).match(/opacity=0.4/g)).toHaveLength(1);
  });
});
