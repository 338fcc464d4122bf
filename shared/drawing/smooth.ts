// Stroke smoothing: a moving average over even arc length (removes finger jitter), Chaikin
// corner cutting (Chaikin 1974, "An algorithm for high speed curve generation"), then
// resampling at even arc length so that later steps see uniform segments.
// Degenerate input: repeated touch points are dropped; fewer than two distinct points give the
// points back unchanged.

import { dist, lerp, Point } from './point';

/** Consecutive points closer than `eps` merged (touch events often repeat a position). */
export function dedupe(points: readonly Point[], eps = 1e-9): Point[] {
  const out: Point[] = [];
  for (const p of points) if (out.length === 0 || dist(out[out.length - 1], p) > eps) out.push(p);
  return out;
}

/** One or more rounds of Chaikin corner cutting; an open polyline keeps its two end points. */
export function chaikin(points: readonly Point[], closed: boolean, rounds = 2): Point[] {
  let current = [...points];
  for (let r = 0; r < rounds && current.length >= 3; r++) {
    const next: Point[] = closed ? [] : [current[0]];
    const n = current.length;
    const segments = closed ? n : n - 1;
    for (let i = 0; i < segments; i++) {
      const p = current[i];
      const q = current[(i + 1) % n];
      if (closed || i > 0) next.push(lerp(p, q, 0.25));
      if (closed || i < segments - 1) next.push(lerp(p, q, 0.75));
    }
    if (!closed) next.push(current[n - 1]);
    current = next;
  }
  return current;
}

/** Polyline length; a closed one includes the segment back to its start. */
export function length(points: readonly Point[], closed: boolean): number {
  let total = 0;
  for (let i = 1; i < points.length; i++) total += dist(points[i - 1], points[i]);
  return closed && points.length > 1 ? total + dist(points[points.length - 1], points[0]) : total;
}

/**
 * Points at even arc length along the polyline, about `spacing` apart (exactly the same
 * spacing everywhere). An open polyline keeps both end points; a closed one starts at its first
 * point and does not repeat it at the end.
 */
export function resample(points: readonly Point[], closed: boolean, spacing: number): Point[] {
  const pts = dedupe(points);
  if (pts.length < 2) return pts;
  const ring = closed ? [...pts, pts[0]] : pts;
  const total = length(pts, closed);
  const pieces = Math.max(closed ? 3 : 1, Math.round(total / spacing));
  const step = total / pieces;
  const out: Point[] = [ring[0]];
  let segment = 0;
  let segmentStart = 0; // arc length at ring[segment]
  for (let k = 1; k < pieces; k++) {
    const target = k * step;
    while (segment < ring.length - 2 && segmentStart + dist(ring[segment], ring[segment + 1]) < target) {
      segmentStart += dist(ring[segment], ring[segment + 1]);
      segment++;
    }
    const len = dist(ring[segment], ring[segment + 1]);
    out.push(lerp(ring[segment], ring[segment + 1], len === 0 ? 0 : Math.min(1, (target - segmentStart) / len)));
  }
  if (!closed) out.push(ring[ring.length - 1]);
  return out;
}

/** Each point replaced by the mean of its `k` neighbours on each side; open ends stay put. */
export function movingAverage(points: readonly Point[], closed: boolean, k: number): Point[] {
  const n = points.length;
  return points.map((p, i) => {
    const reach = closed ? Math.min(k, Math.floor((n - 1) / 2)) : Math.min(k, i, n - 1 - i);
    let x = 0;
    let y = 0;
    for (let j = -reach; j <= reach; j++) {
      const q = points[(i + j + n) % n];
      x += q.x;
      y += q.y;
    }
    return { x: x / (2 * reach + 1), y: y / (2 * reach + 1) };
  });
}

/** Smoothing used for every stroke: averaging over about 2 * spacing each side, Chaikin, resampling. */
export function smoothPath(points: readonly Point[], closed: boolean, spacing: number, rounds = 1): Point[] {
  const fine = resample(points, closed, spacing / 2);
  return resample(chaikin(movingAverage(fine, closed, 4), closed, rounds), closed, spacing);
}
