// Arc-length bookkeeping on polylines: cumulative arcs and the point at a given arc length.

import { dist, lerp, Point, sub } from './point';

/** Cumulative arc length at each point; a closed path gets one more entry, its total length. */
export function arcsOf(points: readonly Point[], closed: boolean): number[] {
  const arcs = [0];
  const n = closed ? points.length : points.length - 1;
  for (let i = 1; i <= n; i++) arcs.push(arcs[i - 1] + dist(points[i - 1], points[i % points.length]));
  return arcs;
}

// The last index i with arcs[i] <= t.
function segmentAt(arcs: readonly number[], t: number): number {
  let [i, j] = [0, arcs.length - 2];
  while (i < j) {
    const m = (i + j + 1) >> 1;
    if (arcs[m] <= t) i = m;
    else j = m - 1;
  }
  return Math.max(0, i);
}

/** The point at arc length s: wrapping round a closed path, clamped to an open one's ends. */
export function pointAt(points: readonly Point[], arcs: readonly number[], s: number, closed = true): Point {
  const total = arcs[arcs.length - 1];
  const t = closed ? ((s % total) + total) % total : Math.max(0, Math.min(total, s));
  const i = segmentAt(arcs, t);
  const len = arcs[i + 1] - arcs[i];
  return lerp(points[i], points[(i + 1) % points.length], len === 0 ? 0 : (t - arcs[i]) / len);
}

/** Unit direction of an open polyline at arc length s. */
export function tangentAt(points: readonly Point[], arcs: readonly number[], s: number): Point {
  const i = segmentAt(arcs, Math.max(0, Math.min(arcs[arcs.length - 1], s)));
  const d = sub(points[i + 1], points[i]);
  const len = Math.hypot(d.x, d.y) || 1;
  return { x: d.x / len, y: d.y / len };
}
