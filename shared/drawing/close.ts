// Where a stroke closes. A finger coming back to where it went down rarely lands on the start:
// a quick stroke has samples 20-60 px apart, so its last sample may lie either side of the start,
// and a sweeping one runs on past it. So the test is on segments, not samples: the stroke closes
// when its last `overshoot` px of length pass within `closeRadius` of its first point; it is cut
// at its nearest approach to the start, so an overshoot is trimmed away.

import type { DrawingOptions } from './options';
import { dist, dot, lerp, Point, sub } from './point';
import { length } from './smooth';

/** The nearest point of segment pq to c, with its parameter along pq. */
function nearestOnSegment(p: Point, q: Point, c: Point): { t: number; at: Point } {
  const d = sub(q, p);
  const len2 = dot(d, d);
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, dot(sub(c, p), d) / len2));
  return { t, at: lerp(p, q, t) };
}

/**
 * The points of an open polyline as they should be kept, and whether they close. A path no
 * longer than 4 close radii never closes (it is a dot or a dash); nor does one whose nearest
 * approach to its start lies within its first 4 close radii.
 */
export function closeStroke(points: readonly Point[], o: DrawingOptions): { points: readonly Point[]; closed: boolean } {
  const open = { points, closed: false };
  const n = points.length;
  if (n < 3 || length(points, false) <= 4 * o.closeRadius) return open;
  const start = points[0];
  let best: { segment: number; at: Point; distance: number } | null = null;
  let fromEnd = 0;
  for (let i = n - 2; i >= 0 && fromEnd <= o.overshoot; i--) {
    const { at } = nearestOnSegment(points[i], points[i + 1], start);
    const d = dist(at, start);
    if (d <= o.closeRadius && (!best || d < best.distance)) best = { segment: i, at, distance: d };
    fromEnd += dist(points[i], points[i + 1]);
  }
  if (!best || length([...points.slice(0, best.segment + 1), best.at], false) <= 4 * o.closeRadius) return open;
  const kept = [...points.slice(0, best.segment + 1)];
  if (dist(kept[kept.length - 1], best.at) > 1e-9) kept.push(best.at);
  return { points: kept, closed: true };
}
