// Band moves on a PD code. A band across a face joins edges a and b there; on the diagram it is
// a saddle that cuts both edges and reconnects the four ends along the band's sides. The band is
// orientable when the two edges run the same way around the face (one into the band's side,
// the other out of it), and then the saddle joins a's tail to b's head and b's tail to a's head:
// the PD code with the labels at the heads of a and b exchanged. That code does not depend on
// which common face is used (both sides give the same reconnection), and it is planar because
// the band lies in the face. After the move, label a names the edge from a's tail to b's head
// and b the edge from b's tail to a's head; later bands refer to these.
// A PD code does not say in which face of one connected piece another piece lies, and a split
// piece can be moved into any face (over everything else), turned so that any of its faces is
// outermost and flipped: so edges of different pieces always bound a common face, coherently,
// and the band between them is the connected sum's (families/sum.ts, the same exchange).

import { faces } from '../moves/faces';
import { connectedPieces, exchangeHeads, orient, PDCode, Slot } from '../pd';
import { diagram } from '../diagram';
import { BandError, BandPresentation, Saddle } from './types';

/** One stage of the movie: the PD code after some bands and the head slot of every label. */
export interface Stage {
  readonly pd: PDCode;
  /** Where each edge enters a crossing, in the orientation of the original link. */
  readonly heads: ReadonlyMap<number, Slot>;
}

const same = (s: Slot, t: Slot): boolean => s.crossing === t.crossing && s.position === t.position;

/**
 * The diagram after each band in turn: stages[0] is the presentation's code, stages[k] the
 * code after bands 1..k. BandError when an edge does not exist, a band joins an edge to itself,
 * the edges share no face, or the band would be non-orientable. PDError for an invalid code.
 */
export function bandStages(p: BandPresentation): Stage[] {
  diagram(p.pd, { unknots: p.unknots }); // validates the code
  const stages: Stage[] = [{ pd: p.pd, heads: orient(p.pd).head }];
  p.saddles.forEach((s, k) => stages.push(saddle(stages[k], s, k + 1)));
  return stages;
}

function saddle(stage: Stage, { a, b }: Saddle, band: number): Stage {
  for (const e of [a, b]) {
    if (!stage.heads.has(e)) throw new BandError(`band ${band}: there is no edge ${e}`);
  }
  if (a === b) throw new BandError(`band ${band} joins edge ${a} to itself; a band joins two different edges`);
  const pieces = connectedPieces(stage.pd);
  const piece = (e: number): number => pieces.findIndex((p) => p.includes(stage.heads.get(e)!.crossing));
  if (piece(a) !== piece(b)) return exchangeHeads(stage, a, b);
  // For every face, the edges on its boundary and whether the face walk runs along each.
  let shared = false;
  for (const face of faces(stage.pd)) {
    const along = (e: number): boolean[] =>
      face.filter((c) => stage.pd[c.crossing][c.arrive] === e).map((c) => same(stage.heads.get(e)!, { crossing: c.crossing, position: c.arrive }));
    const [ua, ub] = [along(a), along(b)];
    if (ua.length === 0 || ub.length === 0) continue;
    shared = true;
    if (ua.some((x) => ub.includes(x))) return exchangeHeads(stage, a, b);
  }
  if (!shared) throw new BandError(`band ${band}: edges ${a} and ${b} do not border a common face`);
  throw new BandError(`band ${band} would make the surface non-orientable: edges ${a} and ${b} run opposite ways around their common face`);
}

/** The number of components of a stage's code, followed along its heads. */
export function cycleCount(stage: Stage): number {
  const seen = new Set<number>();
  let count = 0;
  for (const start of stage.heads.keys()) {
    if (seen.has(start)) continue;
    count++;
    for (let l = start; !seen.has(l); ) {
      seen.add(l);
      const h = stage.heads.get(l)!;
      l = stage.pd[h.crossing][(h.position + 2) % 4];
    }
  }
  return count;
}
