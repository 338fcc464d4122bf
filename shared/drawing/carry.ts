// Flips that follow their crossings through a geometric edit (a drag or a move can carry a
// crossing farther than the flip radius): each flipped crossing before the edit is matched to
// the nearest crossing of the same two components after it, and the result gets exactly the
// flips that make those crossings flipped again. Crossings that vanished lose their flip.

import { analyse } from './analyse';
import { DrawingOptions } from './options';
import { dist } from './point';
import { flipCrossing, Sketch } from './sketch';

export function carryFlips(before: Sketch, after: Sketch, options: Partial<DrawingOptions> = {}): Sketch {
  const was = analyse(before, options).crossings;
  const unflipped = { ...after, flips: [] };
  const now = analyse(unflipped, options).crossings;
  const pair = (c: { over: string; under: string }) => [c.over, c.under].sort().join('|');
  const taken = new Set<number>();
  const wanted = new Set<number>();
  // Every crossing before the edit claims its nearest counterpart, flipped ones and the others
  // alike, so that a flipped crossing cannot take the place of an unflipped neighbour.
  for (const c of [...was].sort((p, q) => Number(q.flipped) - Number(p.flipped))) {
    let best = -1;
    now.forEach((x, i) => {
      if (!taken.has(i) && pair(x) === pair(c) && (best < 0 || dist(x.at, c.at) < dist(now[best].at, c.at))) best = i;
    });
    if (best < 0) continue;
    taken.add(best);
    if (c.flipped) wanted.add(best);
  }
  return now.reduce<Sketch>((s, x, i) => (wanted.has(i) ? flipCrossing(s, { a: x.over, b: x.under, at: x.at }, options) : s), unflipped);
}
