// Reidemeister III: a strand slid across the crossing of two others. On a triangular face whose
// three edges join three different crossings, and where one strand passes over at both of its
// corners, the move is the half-turn of the disc around the triangle: the same three crossings
// with each of the six outside edges reattached at the opposite point of the disc.

import { assemble, directions } from '../assemble';
import { Diagram } from '../diagram';
import { PDError, Slot, writablePD } from '../pd';
import { Corner, faces } from './faces';

/** Triangles on which R3 applies, each as its three corners in order of the face walk. */
export function triangles(d: Diagram): Corner[][] {
  return faces(d.pd).filter((face) => {
    if (face.length !== 3 || new Set(face.map((c) => c.crossing)).size !== 3) return false;
    // Edge k leaves corner k at slot arrive+1 and arrives at corner k+1: over at both ends if both odd.
    return face.some((c, k) => (c.arrive + 1) % 2 === 1 && face[(k + 1) % 3].arrive % 2 === 1);
  });
}

export function applyR3(d: Diagram, triangle: Corner[]): Diagram {
  const ok = triangles(d).some((t) => t.every((c, k) => c.crossing === triangle[k].crossing && c.arrive === triangle[k].arrive));
  if (!ok) throw new PDError('R3 needs a triangle of three crossings where one strand passes over at both corners');
  const { heads, framed, unknotFramings } = directions(d);
  // The disc's boundary counterclockwise: the walk goes clockwise, so corners in reverse, and
  // at each corner its two outside slots in counterclockwise order.
  const ring: Slot[] = [0, 2, 1].flatMap((k) => [2, 3].map((s) => ({ crossing: triangle[k].crossing, position: (triangle[k].arrive + s) % 4 })));
  const at = (s: Slot) => ring.findIndex((r) => r.crossing === s.crossing && r.position === s.position);
  const pd = writablePD(d.pd);
  ring.forEach((s, i) => {
    const from = ring[(i + 3) % 6];
    pd[s.crossing][s.position] = d.pd[from.crossing][from.position];
  });
  const hints = new Map<number, Slot>();
  for (const [label, h] of heads) {
    const i = at(h);
    if (i >= 0) hints.set(label, ring[(i + 3) % 6]);
    else if (!triangle.some((c) => c.crossing === h.crossing)) hints.set(label, h);
  }
  return assemble(pd, hints, framed, unknotFramings);
}
