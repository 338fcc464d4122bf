// Cutting closed paths and joining the cut ends by new pieces: the surgery behind both band
// drawings. Paths are walked in their direction of travel; a cut removes a few points around
// one point and leaves two ends, "in" (where travel arrives) and "out" (where it leaves). Each
// join is a directed piece from an "in" end to an "out" end, so the traced components keep the
// link's orientation. Every point carries its source (which strand or band it came from), so
// the reader can decide each new crossing's over/under.

import { Point } from './point';
import { arcsOf } from './polyline';
import { SketchComponent } from './sketch';

export type Source =
  | { readonly kind: 'strand'; readonly path: number; readonly arc: number }
  | { readonly kind: 'band'; readonly band: number; readonly side: 1 | -1; readonly arc: number }
  /** A finger's tip, past its second strand; `middle` marks where its saddle attaches. */
  | { readonly kind: 'tip'; readonly band: number; readonly middle: boolean };

export interface Traced {
  readonly points: Point[];
  readonly sources: Source[];
}

export interface Cut {
  readonly id: string;
  readonly path: number;
  /** Point index in drawing order. */
  readonly index: number;
  /** Points removed on each side of it. */
  readonly half: number;
}

export interface Join {
  /** `${cut}:in` -> `${cut}:out` (either cut). */
  readonly from: string;
  readonly to: string;
  /** The points strictly between the two ends. */
  readonly piece: Traced;
}

// A closed component in order of travel, each point with its drawing-order arc.
function travelled(c: SketchComponent, path: number): Traced {
  const arcs = arcsOf(c.points, true);
  const n = c.points.length;
  const order = Array.from({ length: n }, (_, j) => (c.reversed ? (n - j) % n : j));
  return { points: order.map((i) => c.points[i]), sources: order.map((i) => ({ kind: 'strand', path, arc: arcs[i] })) };
}

const travelIndex = (c: SketchComponent, i: number) => (c.reversed ? (c.points.length - i) % c.points.length : i);

/**
 * The closed components after the cuts and joins, or a reason when two cuts overlap. Every cut
 * end must be the start or the end of exactly one join.
 */
export function trace(closed: readonly SketchComponent[], cuts: readonly Cut[], joins: readonly Join[]): Traced[] | { reason: string } {
  const paths = closed.map(travelled);
  const out: Traced[] = [];
  // Pieces of cut paths, keyed by the "out" end they start from.
  const pieces = new Map<string, { path: number; from: number; to: number; end: string }>();
  for (let k = 0; k < closed.length; k++) {
    const n = closed[k].points.length;
    const mine = cuts.filter((c) => c.path === k).map((c) => ({ id: c.id, half: c.half, at: travelIndex(closed[k], c.index) })).sort((p, q) => p.at - q.at);
    if (mine.length === 0) {
      out.push(paths[k]);
      continue;
    }
    for (let i = 0; i < mine.length; i++) {
      const next = mine[(i + 1) % mine.length];
      const gap = (next.at - mine[i].at + n) % n || n;
      if (gap <= mine[i].half + next.half + 1) return { reason: 'Two bands are attached too close together: move one end along its strand.' };
      pieces.set(`${mine[i].id}:out`, { path: k, from: mine[i].at + mine[i].half, to: mine[i].at + gap - next.half, end: `${next.id}:in` });
    }
  }
  const joinFrom = new Map(joins.map((j) => [j.from, j]));
  const seen = new Set<string>();
  for (const start of pieces.keys()) {
    if (seen.has(start)) continue;
    const result: Traced = { points: [], sources: [] };
    for (let at = start; !seen.has(at); ) {
      seen.add(at);
      const piece = pieces.get(at)!;
      const n = paths[piece.path].points.length;
      for (let j = piece.from; j <= piece.to; j++) {
        result.points.push(paths[piece.path].points[j % n]);
        result.sources.push(paths[piece.path].sources[j % n]);
      }
      const join = joinFrom.get(piece.end)!;
      result.points.push(...join.piece.points);
      result.sources.push(...join.piece.sources);
      at = join.to;
    }
    out.push(result);
  }
  return out;
}
