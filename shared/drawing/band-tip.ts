// Where a finger's tip reaches over a band's second strand (band-read.ts): square to the strand
// at the band's end, past it by up to `maxOvershoot`, round by the band's half width. The
// saddle sits in the bigon between the tip and the strand, which is a face of the finger
// drawing only when nothing else enters the tip's reach: no other strand and no other part of
// the second strand (a crossing beside the end is the usual one). The reach is shortened to
// clear what lies beyond the strand; a band with no room for it is refused with the reason.

import { add, dot, Point, scale, sub } from './point';
import { SketchComponent } from './sketch';

export interface Tip {
  /** The band's end on the second strand, the strand's unit tangent there, and the unit normal towards the core. */
  readonly q: Point;
  readonly t: Point;
  readonly n: Point;
  /** How far past the strand the centre of the tip's round end lies. */
  readonly overshoot: number;
}

const maxOvershoot = 12;
/** Short of this the lanes would barely cross the strand: the reading would hang on rounding. */
const minOvershoot = 3;
/** Clearance kept around the tip, beside it and beyond it. */
const margin = 3;

// The second strand's points next to index i that stay inside the box: the strand the tip
// crosses, as opposed to a part of it that comes back into the box further along.
function localRun(c: SketchComponent, i: number, inside: (p: Point) => boolean): Set<number> {
  const m = c.points.length;
  const run = new Set([i]);
  for (const step of [1, -1]) {
    for (let j = (i + step + m) % m; inside(c.points[j]) && !run.has(j); j = (j + step + m) % m) run.add(j);
  }
  return run;
}

/** The tip of a band of half width w ending at point `index` of closed[path], its core arriving from `from`; null when there is no room. */
export function tipOf(closed: readonly SketchComponent[], path: number, index: number, from: Point, w: number): Tip | null {
  const strand = closed[path];
  const m = strand.points.length;
  const q = strand.points[index];
  const d = sub(strand.points[(index + 1) % m], strand.points[(index + m - 1) % m]);
  const t = scale(d, 1 / (Math.hypot(d.x, d.y) || 1));
  const n0 = { x: -t.y, y: t.x };
  const n = dot(sub(from, q), n0) < 0 ? scale(n0, -1) : n0;
  // Beside the end, from the strand's near side to the farthest the tip may reach.
  const lateral = (p: Point) => Math.abs(dot(sub(p, q), t));
  const depth = (p: Point) => -dot(sub(p, q), n);
  const inside = (p: Point) => lateral(p) <= w + margin && depth(p) >= -1 && depth(p) <= maxOvershoot + w + margin;
  const run = localRun(strand, index, inside);
  let clear = maxOvershoot + w + margin;
  closed.forEach((c, k) =>
    c.points.forEach((p, j) => {
      if (inside(p) && !(k === path && run.has(j))) clear = Math.min(clear, depth(p));
    }),
  );
  const overshoot = clear - w - margin;
  return overshoot < minOvershoot ? null : { q, t, n, overshoot: Math.min(maxOvershoot, overshoot) };
}

/** The centre of the tip's round end. */
export const tipCentre = (tip: Tip): Point => add(tip.q, scale(tip.n, -tip.overshoot));
