// The standard picture of a connected sum (common practice, e.g. Rolfsen, "Knots and Links",
// 1976, ch. 2): the two summands' pictures side by side at the same size, each cut where its
// first component comes nearest the other, and the cuts joined by two short arcs. Kept only
// when it reads back as the sum (read-back.ts); otherwise null. Either picture may be turned
// over first (reflected top to bottom with every crossing switched: a rotation of space, so
// the same oriented link) so that the two strands run in opposite directions at the cuts, as
// a band sum of oriented strands must.

import { defaultOptions } from '@/shared/drawing/options';
import { Point } from '@/shared/drawing/point';
import { resample } from '@/shared/drawing/smooth';
import { Sketch } from '@/shared/drawing/sketch';
import { Diagram } from '@/shared/knot/diagram';
import { readsBack } from './read-back';
import { layoutToSketch } from './to-sketch';

export interface Picture {
  readonly paths: readonly (readonly Point[])[];
  readonly crossings: readonly { at: Point; sign: number }[];
  readonly framings: readonly (number | null)[];
}

/** Space between the two summands, and how many points either side of a cut are left out. */
const APART = 60;
const CUT = 4;

const extent = (p: Picture) => {
  const all = p.paths.flat();
  const xs = all.map((q) => q.x);
  const ys = all.map((q) => q.y);
  return Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
};

/** The picture mapped point by point (crossing signs kept). */
const mapped = (p: Picture, f: (q: Point) => Point): Picture => ({
  paths: p.paths.map((path) => path.map(f)),
  crossings: p.crossings.map((c) => ({ at: f(c.at), sign: c.sign })),
  framings: p.framings,
});

/** The picture's quarter turns in the plane (the same diagram): tried in turn for a cut with nothing beyond it. */
const turns = (p: Picture) => [
  p,
  mapped(p, (q) => ({ x: -q.y, y: q.x })),
  mapped(p, (q) => ({ x: -q.x, y: -q.y })),
  mapped(p, (q) => ({ x: q.y, y: -q.x })),
];

/**
 * Where the first component is cut: its point farthest right (side 1) or left (side -1), with
 * nothing beyond it in the way of the arcs, and the strand there running down the screen or
 * up as asked (the picture turned over when it ran the other way); null when no quarter turn
 * of the picture has such a point.
 */
function cutOf(picture: Picture, side: 1 | -1, down: boolean) {
  for (const p of turns(picture)) {
    const path = p.paths[0];
    const far = path.reduce((best, q, i) => (side * q.x > side * path[best].x ? i : best), 0);
    const at = path[far];
    if (p.paths.slice(1).flat().some((q) => side * q.x > side * at.x - APART / 2 && Math.abs(q.y - at.y) < APART)) continue;
    const n = path.length;
    const runsDown = path[(far + 1) % n].y > path[(far + n - 1) % n].y;
    return { picture: runsDown === down ? p : mapped(p, (q) => ({ x: q.x, y: -q.y })), index: far };
  }
  return null;
}

/** The picture enlarged to `size` across, its paths resampled to the drawing's spacing. */
function enlarged(p: Picture, size: number): Picture {
  const g = size / extent(p);
  const big = mapped(p, (q) => ({ x: q.x * g, y: q.y * g }));
  return { ...big, paths: big.paths.map((path) => resample(path, true, defaultOptions.spacing)) };
}

/** The two pictures side by side, the smaller one enlarged to the other's size when `same`. */
export function sumPicture(left: Picture, right: Picture, same = true): Picture | null {
  const size = Math.max(extent(left), extent(right));
  const [a, b] = same ? [enlarged(left, size), enlarged(right, size)] : [left, right];
  const l = cutOf(a, 1, false);
  const r0 = cutOf(b, -1, true);
  if (!l || !r0) return null;
  const p = l.picture.paths[0];
  const pAt = p[l.index];
  const qAt0 = r0.picture.paths[0][r0.index];
  const r = mapped(r0.picture, (q) => ({ x: q.x - qAt0.x + pAt.x + APART, y: q.y - qAt0.y + pAt.y }));
  const q = r.paths[0];
  const at = (path: readonly Point[], i: number) => path[(i + path.length) % path.length];
  const along = (path: readonly Point[], from: number, count: number) => Array.from({ length: count }, (_, k) => at(path, from + k));
  // The left strand runs up at its cut, the right one down: from below the left cut across to
  // below the right one, round the right summand, and back across above.
  const joined = [
    ...along(p, l.index + CUT, p.length - 2 * CUT + 1),
    ...along(q, r0.index + CUT, q.length - 2 * CUT + 1),
  ];
  return {
    paths: [resample(joined, true, defaultOptions.spacing), ...l.picture.paths.slice(1), ...r.paths.slice(1)],
    crossings: [...l.picture.crossings, ...r.crossings],
    framings: [left.framings[0] === null || right.framings[0] === null ? null : left.framings[0] + right.framings[0], ...left.framings.slice(1), ...right.framings.slice(1)],
  };
}

/** The sum `target` of the two pictures' diagrams (first components joined) in its standard picture, or null. */
export function sumSketch(left: Picture, right: Picture, target: Diagram): Sketch | null {
  // Enlarging a picture can bring a shallow crossing's strands close for too long (a retrace):
  // then the summands keep their own sizes.
  for (const same of [true, false]) {
    const picture = sumPicture(left, right, same);
    const sketch = picture && layoutToSketch(picture, picture.framings);
    if (sketch && readsBack(sketch, target)) return sketch;
  }
  return null;
}
