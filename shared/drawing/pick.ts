// What a tap hits, and where a component's orientation arrow goes: small geometric queries on
// an Analysis for the Slate.

import { Analysis, DrawnPath } from './analyse';
import { dist, Point, scale, sub } from './point';

/** Index of the crossing nearest to p within `radius`, or null. */
export function crossingNear(a: Analysis, p: Point, radius: number): number | null {
  let best: number | null = null;
  let bestDistance = radius;
  a.crossings.forEach((c, i) => {
    const d = dist(c.at, p);
    if (d <= bestDistance) [best, bestDistance] = [i, d];
  });
  return best;
}

/** The component whose path passes nearest to p within `radius`, and the index of that point. */
export function componentNear(a: Analysis, p: Point, radius: number): { id: string; index: number } | null {
  let best: { id: string; index: number } | null = null;
  let bestDistance = radius;
  for (const path of a.paths) {
    path.points.forEach((q, index) => {
      const d = dist(p, q);
      if (d <= bestDistance) [best, bestDistance] = [{ id: path.id, index }, d];
    });
  }
  return best;
}

/**
 * Where to draw a component's orientation arrow: of eight evenly spaced points along the path,
 * the one farthest from every crossing, with the unit direction of travel there.
 */
export function arrowOf(a: Analysis, path: DrawnPath): { at: Point; direction: Point } {
  const n = path.points.length;
  const candidates = Array.from({ length: 8 }, (_, k) => Math.floor((k * n) / 8) % n);
  const clearance = (i: number) => Math.min(Infinity, ...a.crossings.map((c) => dist(c.at, path.points[i])));
  const i = candidates.reduce((best, k) => (clearance(k) > clearance(best) ? k : best), candidates[0]);
  const next = path.points[Math.min(i + 1, n - 1)];
  const prev = path.points[Math.max(i - 1, 0)];
  const d = sub(next, prev);
  const len = Math.hypot(d.x, d.y) || 1;
  return { at: path.points[i], direction: scale(d, (path.reversed ? -1 : 1) / len) };
}

/** The three corners of an arrowhead at `at` along the unit vector `dir`: the tip `length` ahead, 1.5 lengths long. */
export function arrowHead(at: Point, dir: Point, length: number): Point[] {
  const corners: [number, number][] = [[1, 0], [-0.5, 0.75], [-0.5, -0.75]];
  return corners.map(([u, v]) => ({ x: at.x + length * (dir.x * u - dir.y * v), y: at.y + length * (dir.y * u + dir.x * v) }));
}
