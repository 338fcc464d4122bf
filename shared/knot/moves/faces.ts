// Faces of a planar diagram from the counterclockwise order at each crossing. A face is the
// cycle of slots s -> (other end of s's edge, turned one slot counterclockwise); each slot is
// where the walk leaves a crossing, and the face lies to the right of the walk.

import { connectedPieces, PDCode, PDError, Slot, slotsOf } from '../pd';

export interface Corner {
  /** The crossing the walk passes. */
  crossing: number;
  /** Slot through which the walk arrives; it leaves through (arrive + 1) mod 4. */
  arrive: number;
}

/** Each face as its corners in order of the walk (clockwise around a bounded face). */
export function faces(pd: PDCode): Corner[][] {
  const slots = slotsOf(pd);
  const seen = new Set<number>();
  const result: Corner[][] = [];
  pd.forEach((_, crossing) => {
    for (let position = 0; position < 4; position++) {
      if (seen.has(crossing * 4 + position)) continue;
      const face: Corner[] = [];
      let s: Slot = { crossing, position };
      while (!seen.has(s.crossing * 4 + s.position)) {
        seen.add(s.crossing * 4 + s.position);
        const [p, q] = slots.get(pd[s.crossing][s.position])!;
        const t = p.crossing === s.crossing && p.position === s.position ? q : p;
        face.push({ crossing: t.crossing, arrive: t.position });
        s = { crossing: t.crossing, position: (t.position + 1) % 4 };
      }
      result.push(face);
    }
  });
  return result;
}

/**
 * Throws PDError unless the PD code is a planar diagram: with the counterclockwise order at
 * every crossing, each connected piece of n_i crossings must have n_i + 2 faces (Euler's formula
 * V - E + F = 2 with E = 2V).
 */
export function checkPlanar(pd: PDCode): void {
  const count = faces(pd).length;
  const pieces = connectedPieces(pd).length;
  const expected = pd.length + 2 * pieces;
  if (count !== expected) {
    throw new PDError(`the PD code is not planar: it has ${count} faces where a planar diagram with ${pd.length} crossings in ${pieces} piece${pieces === 1 ? '' : 's'} has ${expected}`);
  }
}
