// A drag of a strand on the Slate goes through carryThroughDrag (lib/slate/band-actions.ts): the
// bands follow it, and a band that cannot is removed with the reason in the band bar's notice.
import { carryThroughDrag } from '@/lib/slate/band-actions';
import { useSlate } from '@/lib/slate/slate-store';
import { addBand, bandsOf } from '@/shared/drawing/bands';
import type { Point } from '@/shared/drawing/point';
import { addStroke, emptySketch, moveComponent, nearestPointIndex, reshapeComponent, type Sketch } from '@/shared/drawing/sketch';

const ellipse = Array.from({ length: 200 }, (_, i): Point => ({ x: 200 + 90 * Math.cos((2 * Math.PI * i) / 200), y: 200 - 140 * Math.sin((2 * Math.PI * i) / 200) }));
const line = (p: Point, q: Point): Point[] => Array.from({ length: 41 }, (_, i) => ({ x: p.x + ((q.x - p.x) * i) / 40, y: p.y + ((q.y - p.y) * i) / 40 }));
const unknot = addStroke(emptySketch, ellipse);
const r = addBand(unknot, line({ x: 112, y: 200 }, { x: 288, y: 200 }));
if ('reason' in r) throw new Error(r.reason);
const across: Sketch = r.sketch;
const id = across.components[0].id;

test('a moved strand takes its band along, and no notice is shown', () => {
  useSlate.getState().setBandNotice('an old notice');
  const sketch = carryThroughDrag(across, moveComponent(across, id, { x: 10, y: 5 }));
  expect(bandsOf(sketch)).toHaveLength(1);
  expect(bandsOf(sketch)[0].core[0]).toEqual({ x: bandsOf(across)[0].core[0].x + 10, y: bandsOf(across)[0].core[0].y + 5 });
  expect(useSlate.getState().bandNotice).toBeNull();
});

test('a band reshaped too short is removed, and the notice says why', () => {
  const right = nearestPointIndex(across.components[0], { x: 290, y: 200 });
  const sketch = carryThroughDrag(across, reshapeComponent(across, id, right, { x: -150, y: 0 }, 40));
  expect(bandsOf(sketch)).toHaveLength(0);
  expect(useSlate.getState().bandNotice).toMatch(/^A band was removed by the edit \(undo brings it back\): Band 1 is too short/);
});
