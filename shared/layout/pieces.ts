// Standard pictures are drawn as open pieces of strand (a twist column, a cap, an arc) whose
// ends meet; this joins them into closed paths and gives each crossing the sign its two
// strands make once the paths' directions of travel are known.

import { cross, dist, Point } from '@/shared/drawing/point';
import { resample } from '@/shared/drawing/smooth';
import { defaultOptions } from '@/shared/drawing/options';

/** A crossing of two pieces: the direction each runs through it, in the piece's own order. */
export interface PieceCrossing {
  readonly at: Point;
  readonly over: { piece: number; direction: Point };
  readonly under: { piece: number; direction: Point };
}

const meet = (p: Point, q: Point) => dist(p, q) < 1e-6;

/**
 * The pieces chained end to end into closed paths (resampled for the drawing analysis), and
 * the crossings with their signs. Seen on screen (y down), a crossing is positive when the
 * under-strand comes from the over-strand's right (the right-handed crossing).
 */
export function joinPieces(pieces: readonly (readonly Point[])[], crossings: readonly PieceCrossing[]) {
  const turn = new Array<number>(pieces.length).fill(0);
  const paths: Point[][] = [];
  for (let start = 0; start < pieces.length; start++) {
    if (turn[start]) continue;
    turn[start] = 1;
    const path = [...pieces[start]];
    for (;;) {
      const end = path[path.length - 1];
      const next = pieces.findIndex((p, k) => !turn[k] && (meet(p[0], end) || meet(p[p.length - 1], end)));
      if (next < 0) break;
      turn[next] = meet(pieces[next][0], end) ? 1 : -1;
      path.push(...(turn[next] > 0 ? pieces[next] : [...pieces[next]].reverse()).slice(1));
    }
    if (!meet(path[0], path[path.length - 1])) throw new Error('the pieces of a picture do not close up');
    paths.push(resample(path.slice(1), true, defaultOptions.spacing));
  }
  const along = (s: { piece: number; direction: Point }) => ({ x: s.direction.x * turn[s.piece], y: s.direction.y * turn[s.piece] });
  return {
    paths,
    crossings: crossings.map((c) => ({ at: c.at, sign: -Math.sign(cross(along(c.over), along(c.under))) })),
  };
}
