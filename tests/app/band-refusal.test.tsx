// A drag with the Bands tool goes through finishBand (lib/slate/band-actions.ts): a band the
// drawing side cannot read into a band presentation is refused when drawn, with the reason in
// the band bar's notice, instead of being accepted and left uncertified.
import { finishBand } from '@/lib/slate/band-actions';
import { emptyDoc } from '@/lib/slate/record';
import { useSlate } from '@/lib/slate/slate-store';
import { bandsOf } from '@/shared/drawing/bands';
import type { Point } from '@/shared/drawing/point';
import { closedBraidSketch } from '@/shared/layout';

const line = (p: Point, q: Point): Point[] => Array.from({ length: 41 }, (_, i) => ({ x: p.x + ((q.x - p.x) * i) / 40, y: p.y + ((q.y - p.y) * i) / 40 }));
const trefoil = closedBraidSketch([1, 1, 1])!;

beforeEach(() => useSlate.getState().open(null, { ...emptyDoc, sketch: trefoil }));

test('a band whose finger drawing has two crossings too close together is refused, with the reason', () => {
  finishBand(line({ x: 157, y: 54 }, { x: 55, y: 134 }));
  expect(bandsOf(useSlate.getState().history.present.sketch)).toHaveLength(0);
  expect(useSlate.getState().bandNotice).toMatch(/^With the bands: Two crossings are too close together/);
});

test('a band that is read is drawn, and no notice is shown', () => {
  // The reported chord across the inner face of T(2,17) drawn as a closed braid, which the band
  // mathematics takes (tests/shared/drawing-band-refusal.test.ts).
  useSlate.getState().open(null, { ...emptyDoc, sketch: closedBraidSketch(Array<number>(17).fill(1))! });
  useSlate.getState().setBandNotice('an old notice');
  finishBand(line({ x: 949.81, y: 514.72 }, { x: 83.7, y: 594.24 }));
  expect(bandsOf(useSlate.getState().history.present.sketch)).toHaveLength(1);
  expect(useSlate.getState().bandNotice).toBeNull();
});
