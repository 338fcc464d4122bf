// The visible pieces of a path once the gaps of its under-crossings are cut out, for renderers
// and exporters. Gaps are arc-length intervals (from..to, wrapping past the end of a closed path).

import { dist, lerp, Point } from './point';

export interface ArcInterval {
  readonly from: number;
  readonly to: number;
}

const inside = (s: number, g: ArcInterval): boolean => (g.from <= g.to ? s > g.from && s < g.to : s > g.from || s < g.to);

/** The polyline pieces of `points` left visible by `gaps`, in path order. */
export function visiblePieces(points: readonly Point[], closed: boolean, gaps: readonly ArcInterval[]): Point[][] {
  if (points.length < 2) return [points.slice()];
  const ring = closed ? [...points, points[0]] : points;
  const cuts = gaps.flatMap((g) => [g.from, g.to]).sort((a, b) => a - b);
  const hidden = (s: number) => gaps.some((g) => inside(s, g));
  const pieces: Point[][] = [];
  let current: Point[] | null = null;
  let arc = 0;
  for (let i = 0; i + 1 < ring.length; i++) {
    const p = ring[i];
    const q = ring[i + 1];
    const len = dist(p, q);
    const stops = [arc, ...cuts.filter((c) => c > arc && c < arc + len), arc + len];
    for (let k = 0; k + 1 < stops.length; k++) {
      const at = (s: number) => lerp(p, q, len === 0 ? 0 : (s - arc) / len);
      if (hidden((stops[k] + stops[k + 1]) / 2)) {
        current = null;
        continue;
      }
      if (!current) {
        current = [at(stops[k])];
        pieces.push(current);
      }
      current.push(at(stops[k + 1]));
    }
    arc += len;
  }
  // A closed path visible across its starting point is one piece, not two.
  if (closed && pieces.length > 1 && !hidden(0) && !hidden(arc - 1e-9)) {
    const last = pieces.pop()!;
    pieces[0] = [...last, ...pieces[0].slice(1)];
  }
  return pieces;
}

/** The gap each crossing cuts into its under-strand: `radius` either side, wrapping round. */
export function gapsAround<C extends { readonly under: string; readonly underArc: number }>(
  crossings: readonly C[],
  lengths: ReadonlyMap<string, number>,
  radius: number,
): { component: string; crossing: number; from: number; to: number }[] {
  return crossings.map((c, crossing) => {
    const total = lengths.get(c.under)!;
    const wrap = (s: number) => ((s % total) + total) % total;
    return { component: c.under, crossing, from: wrap(c.underArc - radius), to: wrap(c.underArc + radius) };
  });
}
