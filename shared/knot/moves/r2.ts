// Reidemeister II: one edge pushed across another edge of the same face (making a bigon), or a
// bigon whose one strand passes over at both ends taken away.

import { assemble, directions } from '../assemble';
import { Diagram } from '../diagram';
import { PDError, Slot, writablePD, type WritablePD } from '../pd';
import { Corner, faces } from './faces';
import { splice } from './splice';

/**
 * In a face, the edge E arriving at corner i is pushed across the edge F arriving at corner j
 * (a finger of E inside the face), E over F when `eOver`. E and F must be different edges.
 */
export function pushAcross(d: Diagram, face: readonly Corner[], i: number, j: number, eOver: boolean): Diagram {
  const n = face.length;
  const edge = (k: number) => {
    const before = face[(k + n - 1) % n];
    const start: Slot = { crossing: before.crossing, position: (before.arrive + 1) % 4 };
    const end: Slot = { crossing: face[k].crossing, position: face[k].arrive };
    return { label: d.pd[end.crossing][end.position], start, end };
  };
  const E = edge(i);
  const F = edge(j);
  if (i === j || E.label === F.label) throw new PDError('R2 needs two different edges of the face');
  const { heads, framed, unknotFramings } = directions(d);
  const next = Math.max(...d.pd.flat()) + 1;
  const [e2, e3, f2, f3] = [next, next + 1, next + 2, next + 3];
  const pd = writablePD(d.pd);
  pd[E.end.crossing][E.end.position] = e3;
  pd[F.end.crossing][F.end.position] = f3;
  // Along the walk (face on the right) E meets the finger's crossings P then Q, F meets Q then
  // P; counterclockwise P = [E1, F3, E2, F2] and Q = [E3, F2, E2, F1], with E1 = E and F1 = F
  // kept at their starts. Rotated so the under-strand sits at slots a and c.
  const [p, q]: WritablePD = eOver ? [[f3, e2, f2, E.label], [f2, e2, F.label, e3]] : [[E.label, f3, e2, f2], [e3, f2, e2, F.label]];
  const [P, Q] = [pd.length, pd.length + 1];
  pd.push(p, q);
  const hints = new Map<number, Slot>();
  for (const [label, h] of heads) if (label !== E.label && label !== F.label) hints.set(label, h);
  const same = (s: Slot, t: Slot) => s.crossing === t.crossing && s.position === t.position;
  // An edge running along the walk now enters P (or Q) as its first piece; otherwise it still ends at its start.
  hints.set(E.label, same(heads.get(E.label)!, E.end) ? { crossing: P, position: p.indexOf(E.label) } : E.start);
  hints.set(F.label, same(heads.get(F.label)!, F.end) ? { crossing: Q, position: q.indexOf(F.label) } : F.start);
  return assemble(pd, hints, framed, unknotFramings);
}

/**
 * At crossing `crossing`, the edge E at slot `position` and the edge F at the next slot
 * counterclockwise bound a corner; a finger of E is pushed across F inside that corner, E over
 * F when `eOver`.
 */
export function addBigon(d: Diagram, crossing: number, position: number, eOver: boolean): Diagram {
  if (!d.pd[crossing] || !Number.isInteger(position) || position < 0 || position > 3) throw new PDError(`there is no slot ${position + 1} at crossing ${crossing + 1}`);
  for (const face of faces(d.pd)) {
    const i = face.findIndex((c) => c.crossing === crossing && c.arrive === position);
    if (i >= 0) return pushAcross(d, face, i, (i + 1) % face.length, eOver);
  }
  throw new PDError(`there is no corner at slot ${position + 1} of crossing ${crossing + 1}`);
}

export interface Bigon {
  crossings: [number, number];
  /** The joins that undo it: (entering, leaving) along each of the two strands. */
  joins: [[number, number], [number, number]];
}

/** Bigons between two different crossings where one strand passes over at both ends. */
export function bigons(d: Diagram): Bigon[] {
  const pd = d.pd;
  return faces(pd).flatMap((face) => {
    if (face.length !== 2) return [];
    const [y, x] = face; // the walk arrives at y, leaves it, arrives at x, leaves it
    if (x.crossing === y.crossing) return [];
    // Edge u leaves x at slot x.arrive + 1 and arrives at y.arrive; edge v leaves y at y.arrive + 1 and arrives at x.arrive.
    const uAtX = (x.arrive + 1) % 4;
    if (uAtX % 2 !== y.arrive % 2) return [];
    const strandU: [number, number] = [pd[x.crossing][(uAtX + 2) % 4], pd[y.crossing][(y.arrive + 2) % 4]];
    const strandV: [number, number] = [pd[y.crossing][(y.arrive + 3) % 4], pd[x.crossing][(x.arrive + 2) % 4]];
    return [{ crossings: [x.crossing, y.crossing], joins: [strandU, strandV] }];
  });
}

export function removeBigon(d: Diagram, bigon: Bigon): Diagram {
  return splice(d, bigon.crossings, bigon.joins);
}
