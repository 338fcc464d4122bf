// A band the drawing side accepts is one the band mathematics takes: random chords on a few
// layouts are either refused when drawn (addBand, bandShapes, readBands: with the reason) or
// read into a presentation whose saddles shared/knot/bands applies without a BandError, giving
// as many components as the drawing after the band moves. readBands also refuses, as a last
// guard, what the band mathematics would refuse; the drawing side's own checks must come first,
// so no chord here may reach that guard.

import { bandShapes } from '@/shared/drawing/band-shape';
import { readBands, unreadSaddles } from '@/shared/drawing/band-read';
import { addBand } from '@/shared/drawing/bands';
import { Point } from '@/shared/drawing/point';
import { Sketch } from '@/shared/drawing/sketch';
import { afterBands } from '@/shared/knot/bands';
import { seededRng } from '@/shared/knot/moves/random';
import { closedBraidSketch, layoutPD, layoutToSketch } from '@/shared/layout';
import { p33m3 } from './bands-fixtures';
import { segment } from './drawing-fixtures';

type Outcome = { refused: string } | { components: number; drawn: number };

// What the Slate does with a straight drag from p to q: the first refusal, or the band read and
// its saddles applied (a BandError thrown by the knot side fails the test).
function outcome(s: Sketch, p: Point, q: Point): Outcome {
  const added = addBand(s, segment(p, q));
  if ('reason' in added) return { refused: added.reason };
  const shape = bandShapes(added.sketch).at(-1)!;
  if ('reason' in shape) return { refused: shape.reason };
  const r = readBands(added.sketch);
  if (!r || 'reason' in r) return { refused: r ? r.reason : 'no bands' };
  return { components: afterBands({ ...r.presentation, saddles: [...r.presentation.saddles] }).components, drawn: r.afterDiagram.components };
}

const t217 = closedBraidSketch(Array<number>(17).fill(1))!;
const layouts: [string, Sketch][] = [
  ['9_46 = P(3,3,-3)', layoutToSketch(layoutPD(p33m3.pd.map((x) => [...x]) as [number, number, number, number][], 0), [])],
  ['T(2,17) as a closed braid', t217],
  ['the trefoil as a closed braid', closedBraidSketch([1, 1, 1])!],
];

describe('bands the drawing side accepts, the knot side takes', () => {
  test('T(2,17): a drag that starts just outside the inner strand is read as the band it is', () => {
    // The reported chord: the drag begins 4 units beyond the strand, so the smoothed core first
    // heads outwards; the band's side was chosen from that first step, the wrong way round.
    const r = outcome(t217, { x: 949.81, y: 514.72 }, { x: 83.7, y: 594.24 });
    // Both ends lie on the inner face's boundary, which a closed braid's strands all run round
    // the same way (common practice): an oriented band, so it is accepted; an oriented band on a
    // knot splits it into two components (common practice: it changes the Euler characteristic
    // of the link's oriented resolution by one, so the number of components by one).
    expect(r).toEqual({ components: 2, drawn: 2 });
  });

  test('a band ending beside another strand is refused with the reason', () => {
    // The trefoil's top: the end lies about 12 units inside the outer lobe, too close for the
    // finger's tip to pass over its strand alone, so the saddle's bigon is not a face.
    const tre = layouts[2][1];
    expect(outcome(tre, { x: 189.18, y: 238.55 }, { x: 178.91, y: 71.79 })).toEqual({ refused: expect.stringMatching(/too close to a crossing or another strand/) });
  });

  test.each(layouts)('random chords on %s: refused, or read and taken', (_, s) => {
    const rnd = seededRng(7); // deterministic chords
    const points = s.components.flatMap((c) => c.points);
    // A finger lands within 8 units of the strand it means.
    const near = () => {
      const p = points[Math.floor(rnd() * points.length)];
      return { x: p.x + (rnd() - 0.5) * 16, y: p.y + (rnd() - 0.5) * 16 };
    };
    let taken = 0;
    for (let i = 0; i < 120; i++) {
      const r = outcome(s, near(), near());
      if ('refused' in r) {
        expect(r.refused).not.toContain(unreadSaddles);
        continue;
      }
      taken++;
      expect(r.components).toBe(r.drawn);
    }
    // Enough chords are taken for the check to mean something.
    expect(taken).toBeGreaterThan(10);
  });
});
