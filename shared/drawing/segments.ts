// Segment geometry and a uniform grid that finds the pairs of segments lying within a distance
// of each other (a standard broad phase: bucket bounding boxes, test only pairs sharing a cell).

import { cross, dist, dot, lerp, Point, sub } from './point';

export interface Segment {
  readonly p: Point;
  readonly q: Point;
}

/**
 * Proper intersection of pq and rs as parameters (t on pq, u on rs), half-open [0, 1) on both
 * so a crossing through a shared vertex of consecutive segments is found once. Parallel
 * segments never intersect here (overlaps are caught as near-touches by the caller).
 */
export function intersect(a: Segment, b: Segment): { t: number; u: number } | null {
  const r = sub(a.q, a.p);
  const s = sub(b.q, b.p);
  const denom = cross(r, s);
  if (denom === 0) return null;
  const w = sub(b.p, a.p);
  const t = cross(w, s) / denom;
  const u = cross(w, r) / denom;
  return t >= 0 && t < 1 && u >= 0 && u < 1 ? { t, u } : null;
}

const pointSegment = (p: Point, s: Segment): number => {
  const d = sub(s.q, s.p);
  const len2 = dot(d, d);
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, dot(sub(p, s.p), d) / len2));
  return dist(p, lerp(s.p, s.q, t));
};

/** Smallest distance between two segments (0 when they intersect). */
export function segmentDistance(a: Segment, b: Segment): number {
  if (intersect(a, b)) return 0;
  return Math.min(pointSegment(a.p, b), pointSegment(a.q, b), pointSegment(b.p, a), pointSegment(b.q, a));
}

/** Index pairs i < j of segments whose bounding boxes, grown by `within`, share a grid cell. */
export function nearbyPairs(segments: readonly Segment[], within: number, cell: number): [number, number][] {
  const grid = new Map<number, number[]>();
  segments.forEach((s, i) => {
    const x0 = Math.floor((Math.min(s.p.x, s.q.x) - within) / cell);
    const x1 = Math.floor((Math.max(s.p.x, s.q.x) + within) / cell);
    const y0 = Math.floor((Math.min(s.p.y, s.q.y) - within) / cell);
    const y1 = Math.floor((Math.max(s.p.y, s.q.y) + within) / cell);
    for (let x = x0; x <= x1; x++) {
      for (let y = y0; y <= y1; y++) {
        const key = (x + 1048576) * 2097152 + (y + 1048576); // exact: well below 2^53
        const list = grid.get(key);
        if (list) list.push(i);
        else grid.set(key, [i]);
      }
    }
  });
  const seen = new Set<number>();
  const pairs: [number, number][] = [];
  const n = segments.length;
  for (const list of grid.values()) {
    for (let x = 0; x < list.length; x++) {
      for (let y = x + 1; y < list.length; y++) {
        const i = Math.min(list[x], list[y]);
        const j = Math.max(list[x], list[y]);
        const key = i * n + j;
        if (!seen.has(key)) {
          seen.add(key);
          pairs.push([i, j]);
        }
      }
    }
  }
  return pairs;
}
