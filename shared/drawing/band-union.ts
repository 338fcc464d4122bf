// Two band drawings on the same strands as one drawing with both sets of bands, so that the two
// surfaces are read on one PD code (the finger moves of both: shared/knot/bands compareSurfaces).
// The first drawing's bands keep their numbers and the second's follow, so between the two sets
// the second passes under (docs/conventions.md, Bands), as it did under nothing before: each
// surface's finger moves stay isotopies of the link that avoid its own bands.

import { bandsOf } from './bands';
import { dist, Point } from './point';
import { Sketch } from './sketch';

/** Strands drawn within this many pixels of each other count as the same drawing (saved coordinates are rounded). */
const tolerance = 0.5;

const samePoints = (p: readonly Point[], q: readonly Point[]) => p.length === q.length && p.every((x, i) => dist(x, q[i]) <= tolerance);

/** The same strands, orientations and crossing flips: the same diagram, crossing for crossing. */
export function sameStrands(a: Sketch, b: Sketch): boolean {
  if (a.components.length !== b.components.length || a.flips.length !== b.flips.length) return false;
  const flipOf = (s: Sketch, f: Sketch['flips'][number]) => s.flips.some((g) => g.a === f.a && g.b === f.b && dist(g.at, f.at) <= tolerance);
  return (
    a.components.every((c, i) => {
      const d = b.components[i];
      return c.id === d.id && c.closed === d.closed && c.reversed === d.reversed && samePoints(c.points, d.points);
    }) && a.flips.every((f) => flipOf(b, f))
  );
}

/** a's strands with a's bands, then b's (renamed apart); null unless the strands are the same (sameStrands). */
export function bandUnion(a: Sketch, b: Sketch): Sketch | null {
  if (!sameStrands(a, b)) return null;
  return { ...a, bands: [...bandsOf(a), ...bandsOf(b).map((band) => ({ ...band, id: `other-${band.id}` }))] };
}
