// A small curl (a Reidemeister I loop) put into a closed traced path just before a point, so
// that the point gets an edge of its own in the PD code: a saddle needs two distinct edges,
// and a component without crossings has none. The loop is one arch of a prolate cycloid
// (x = r t - d sin t, y = d (1 + cos t), d = 2r over t in [-pi, pi]): one self-crossing at
// about 100 degrees, its ends tangent to the chord. It bulges to the side with more room.

import { add, dist, Point, scale, sub } from './point';
import { resample } from './smooth';
import { Source, Traced } from './band-trace';

/** How many points before the marked one the curl ends, and how many it replaces. */
const before = 6;
const span = 13;

function curl(p0: Point, p1: Point, side: 1 | -1, spacing: number): Point[] {
  const chord = sub(p1, p0);
  const len = Math.hypot(chord.x, chord.y) || 1;
  const t = scale(chord, 1 / len);
  const m = { x: -t.y * side, y: t.x * side };
  const r = len / (2 * Math.PI);
  const fine = Array.from({ length: 121 }, (_, i) => {
    const u = -Math.PI + (2 * Math.PI * i) / 120;
    return add(p0, add(scale(t, r * (u + Math.PI) - 2 * r * Math.sin(u)), scale(m, 2 * r * (1 + Math.cos(u)))));
  });
  return resample(fine, false, spacing);
}

/**
 * `traced[path]` with a curl ending `before` points ahead of point `at` (the path rotated so
 * the curl does not wrap round its start); the others are only measured, to pick the side.
 */
export function withKink(traced: readonly Traced[], path: number, at: number, spacing: number): Traced {
  const { points, sources } = traced[path];
  const n = points.length;
  const startAt = 4; // after the rotation: the curl spans startAt..end, then `before` points to `at`
  const end = startAt + span;
  const shift = (at - (end + before) + n) % n;
  const rot = <T>(xs: readonly T[]) => [...xs.slice(shift), ...xs.slice(0, shift)];
  const [pts, srcs] = [rot(points), rot(sources)];
  const others = traced.flatMap((t, k) => (k === path ? pts.filter((_, i) => i < startAt - 8 || i > end + 8) : t.points));
  const clearance = (loop: Point[]) => Math.min(...loop.map((p) => Math.min(Infinity, ...others.map((q) => dist(p, q)))));
  const [left, right] = [curl(pts[startAt], pts[end], 1, spacing), curl(pts[startAt], pts[end], -1, spacing)];
  const loop = clearance(left) >= clearance(right) ? left : right;
  const inner = loop.slice(1, -1);
  return {
    points: [...pts.slice(0, startAt + 1), ...inner, ...pts.slice(end)],
    sources: [...srcs.slice(0, startAt + 1), ...inner.map((): Source => ({ kind: 'kink' })), ...srcs.slice(end)],
  };
}
