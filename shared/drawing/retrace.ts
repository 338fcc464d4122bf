// A crossing nobody can see: two strands that run side by side, closer than `retraceWidth`,
// for `retraceLength` either side of the point where they cross (a circle traced twice, a strand
// drawn back along another). Read as a crossing it would change the framing without a word, so
// the drawing gets a marker instead. A visible crossing fails the test within a few pixels: at
// angle a the strands are L sin(a) apart at distance L from it, and a kink's strands part at once.

import type { Passage, Path } from './crossings';
import type { DrawingOptions } from './options';
import { dist, Point } from './point';
import { arcsOf, pointAt } from './polyline';

/**
 * Whether the crossing of these two passages is a retrace: every point of the first strand
 * within `retraceLength` of the crossing lies within `retraceWidth` of the second strand, near
 * the point that has travelled as far from the crossing (in either direction).
 */
export function isRetrace(paths: readonly Path[], passages: readonly [Passage, Passage], o: DrawingOptions): boolean {
  const [a, b] = passages.map((p) => ({ points: paths[p.path].points, arcs: arcsOf(paths[p.path].points, true), arc: p.arc }));
  const near = (p: Point, s: number) => {
    for (let r = s - o.retraceWidth; r <= s + o.retraceWidth; r += o.spacing / 2) {
      if (dist(p, pointAt(b.points, b.arcs, b.arc + r)) < o.retraceWidth || dist(p, pointAt(b.points, b.arcs, b.arc - r)) < o.retraceWidth) return true;
    }
    return false;
  };
  for (let s = o.spacing; s <= o.retraceLength; s += o.spacing) {
    if (!near(pointAt(a.points, a.arcs, a.arc + s), s) || !near(pointAt(a.points, a.arcs, a.arc - s), s)) return false;
  }
  return true;
}
