// The standard picture of a pretzel link P(a1, ..., an) (common practice): n vertical columns
// side by side, column i twisting its two strands |ai| times, the right strand of each column
// capped to the left strand of the next at top and bottom, and the first column's left strand
// to the last one's right strand by one arc over the top and one under the bottom. Kept only
// when it reads back as pretzelLink(a) (read-back.ts); otherwise null.

import { Point } from '@/shared/drawing/point';
import { Sketch } from '@/shared/drawing/sketch';
import { pretzelLink } from '@/shared/knot/families';
import { joinPieces, PieceCrossing } from './pieces';
import { readsBack } from './read-back';
import { layoutToSketch } from './to-sketch';

/** Column pitch and width, height of one half-twist, and the sampling step (pixels). */
const PITCH = 90;
const WIDTH = 40;
const TWIST = 36;
const STEP = 2;

/** Points along an arc of an ellipse from angle a0 to a1 (screen coordinates, y down). */
const arc = (cx: number, cy: number, rx: number, ry: number, a0: number, a1: number): Point[] => {
  const n = Math.max(8, Math.ceil((Math.abs(a1 - a0) * Math.max(rx, ry)) / STEP));
  return Array.from({ length: n + 1 }, (_, i) => {
    const a = a0 + ((a1 - a0) * i) / n;
    return { x: cx + rx * Math.cos(a), y: cy + ry * Math.sin(a) };
  });
};

export function pretzelPicture(twists: readonly number[]) {
  const height = TWIST * Math.max(1, ...twists.map(Math.abs));
  const pieces: Point[][] = [];
  const crossings: PieceCrossing[] = [];
  twists.forEach((a, i) => {
    const left = i * PITCH;
    const n = Math.abs(a);
    const rise = height / Math.max(n, 1);
    const samples = Math.ceil(rise / STEP);
    // Two strands upward from the column's bottom corners, swapping sides at each half-twist.
    const first = pieces.length;
    for (const start of [0, 1]) {
      const points: Point[] = [{ x: left + start * WIDTH, y: height }];
      for (let m = 0, side = start; m < Math.max(n, 1); m++, side = n ? 1 - side : side) {
        for (let k = 1; k <= samples; k++) {
          const u = k / samples;
          const ease = n ? (1 - Math.cos(Math.PI * u)) / 2 : 0;
          points.push({ x: left + WIDTH * (side + (1 - 2 * side) * ease), y: height - rise * (m + u) });
        }
      }
      pieces.push(points);
    }
    for (let m = 0; m < n; m++) {
      // The strand entering a half-twist from the left crosses over when a > 0.
      const fromLeft = m % 2 === 0 ? first : first + 1;
      const fromRight = m % 2 === 0 ? first + 1 : first;
      const up = { x: WIDTH, y: -rise };
      const upLeft = { x: -WIDTH, y: -rise };
      const [over, under] = a > 0 ? [{ piece: fromLeft, direction: up }, { piece: fromRight, direction: upLeft }] : [{ piece: fromRight, direction: upLeft }, { piece: fromLeft, direction: up }];
      crossings.push({ at: { x: left + WIDTH / 2, y: height - rise * (m + 0.5) }, over, under });
    }
  });
  const gap = (PITCH - WIDTH) / 2;
  const span = ((twists.length - 1) * PITCH + WIDTH) / 2;
  for (const [y, dir] of [[0, 1], [height, -1]]) {
    for (let i = 0; i + 1 < twists.length; i++) pieces.push(arc(i * PITCH + WIDTH + gap, y, gap, gap, Math.PI, Math.PI + dir * Math.PI));
    pieces.push(arc(span, y, span, gap + 40, Math.PI, Math.PI + dir * Math.PI));
  }
  return joinPieces(pieces, crossings);
}

/** P(a1, ..., an) in its standard picture, or null when that does not read back as the link. */
export function pretzelSketch(twists: readonly number[]): Sketch | null {
  const sketch = layoutToSketch(pretzelPicture(twists));
  return readsBack(sketch, pretzelLink(twists)) ? sketch : null;
}
