// Comparing two band surfaces drawn on the same strands (components/readout/local-compare.ts).
// The unknot drawn as an ellipse crosses nothing, so its fingers cannot be taken back (the cube
// leaves crossingless circles out): both are read on one drawing with both sets of bands, and
// their classes in Kh(K; F2) compared there.

import { certifyBands } from '@/components/readout/local-bands';
import { compareSketches } from '@/components/readout/local-compare';
import { bandsOf } from '@/shared/drawing/bands';
import { readBands } from '@/shared/drawing/band-read';
import { bandUnion } from '@/shared/drawing/band-union';
import { addStroke, emptySketch, moveComponent, Sketch } from '@/shared/drawing/sketch';
import { bandFrom as band, tallEllipse as ellipse, touches } from './drawing-fixtures';

// Where the horizontal line at height y meets the ellipse.
const across = (s: Sketch, y: number): Sketch => {
  const half = 90 * Math.sqrt(1 - ((y - 200) / 140) ** 2);
  return band(s, { x: 200 - half + 2, y }, { x: 200 + half - 2, y });
};

const unknot = addStroke(emptySketch, touches(ellipse, 400, 0.5, 1));
const disk = across(unknot, 200);
const otherDisk = across(unknot, 120);
// A band across the ellipse and a vertical one under it: one band splits the unknot, the other
// joins the two circles again, so the surface has chi = 1 - 2 = -1, a punctured torus.
const torus = band(across(unknot, 280), { x: 200, y: 62 }, { x: 200, y: 338 });

describe('the class of a drawn band surface', () => {
  test('a ribbon disk of the unknot: nonzero at (h, q) = (0, 1)', () => {
    const r = readBands(disk);
    if (!r || 'reason' in r) throw new Error('unread');
    const answer = certifyBands({ ...r.presentation, saddles: [...r.presentation.saddles] });
    expect(answer.ribbon).toBe(true);
    // The class of a ribbon disk is nonzero, in quantum degree chi = 1 (issue 18, after Sundberg
    // and Swann, "Relative Khovanov-Jacobsson classes", 2021, arXiv 2103.01438).
    expect(answer.surface).toMatchObject({ value: { h: 0, q: 1, zero: false } });
  });

  test('the punctured torus: chi = -1, and its class is zero over F2', () => {
    const r = readBands(torus);
    if (!r || 'reason' in r) throw new Error(r ? r.reason : 'unread');
    const answer = certifyBands({ ...r.presentation, saddles: [...r.presentation.saddles] });
    expect(answer).toMatchObject({ chi: -1, genusBound: 1 });
    // A standard (compressible) torus is a disk with a handle added; the handle acts on Khovanov's
    // Frobenius algebra as multiplication by 2x, zero over F2 (Khovanov, "A categorification of
    // the Jones polynomial", 2000, arXiv math/9908171, sections 2-3; from memory).
    expect(answer.surface).toMatchObject({ value: { q: -1, zero: true } });
  });
});

describe('comparing two sketches', () => {
  test('two ribbon disks of the unknot: equal classes, no conclusion', () => {
    // Kh^{0,1}(unknot; F2) is one-dimensional (Khovanov 2000), so both nonzero classes agree.
    const r = compareSketches({ a: disk, b: otherDisk });
    expect(r).toMatchObject({ kind: 'compared', on: 'union', verdict: 'equal: no conclusion', a: { q: 1, zero: false }, b: { q: 1, zero: false } });
  });

  test('a disk and a torus: their classes differ', () => {
    const r = compareSketches({ a: disk, b: torus });
    expect(r).toMatchObject({ kind: 'compared', verdict: 'differ', a: { q: 1, zero: false }, b: { q: -1, zero: true } });
  });

  test('the order of the two sketches only swaps the classes', () => {
    const ab = compareSketches({ a: disk, b: otherDisk });
    const ba = compareSketches({ a: otherDisk, b: disk });
    if (ab.kind !== 'compared' || ba.kind !== 'compared') throw new Error('not compared');
    expect(ba.verdict).toBe(ab.verdict);
    expect([ba.a.q, ba.b.q]).toEqual([ab.b.q, ab.a.q]);
  });

  test('other strands (the same knot moved) are another diagram: no comparison', () => {
    const moved = moveComponent(otherDisk, otherDisk.components[0].id, { x: 5, y: 0 });
    expect(bandUnion(disk, moved)).toBeNull();
    expect(compareSketches({ a: disk, b: moved })).toEqual({ kind: 'not-same' });
  });

  test('the union keeps the first sketch bands first, the second renamed apart', () => {
    const u = bandUnion(disk, otherDisk)!;
    expect(bandsOf(u).map((b) => b.core)).toEqual([...bandsOf(disk), ...bandsOf(otherDisk)].map((b) => b.core));
    expect(new Set(bandsOf(u).map((b) => b.id)).size).toBe(2);
  });
});
