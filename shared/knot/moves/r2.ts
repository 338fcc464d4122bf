// Reidemeister II: one edge pushed over its neighbour at a corner of a crossing (making a
// bigon), or a bigon whose one strand passes over at both ends taken away.

import { assemble, directions } from '../assemble';
import { Diagram } from '../diagram';
import { Crossing, PDError, Slot } from '../pd';
import { faces } from './faces';
import { splice } from './splice';

/**
 * At crossing `crossing`, the edge E at slot `position` and the edge F at the next slot
 * counterclockwise bound a corner; a finger of E is pushed across F inside that corner, E over
 * F when `eOver`. Both edges must differ.
 */
export function addBigon(d: Diagram, crossing: number, position: number, eOver: boolean): Diagram {
  const x = d.pd[crossing];
  if (!x) throw new PDError(`there is no crossing ${crossing + 1}`);
  const q = (position + 1) % 4;
  const [E, F] = [x[position], x[q]];
  if (E === F) throw new PDError(`the corner at slot ${position + 1} of crossing ${crossing + 1} is a kink's loop`);
  const { heads, framed, unknotFramings } = directions(d);
  const next = Math.max(...d.pd.flat()) + 1;
  const [ea, eb, fa, fb] = [next, next + 1, next + 2, next + 3];
  const pd = d.pd.map((c) => [...c]);
  pd[crossing][position] = ea;
  pd[crossing][q] = fa;
  // Corner geometry (E leaving the crossing eastwards, F northwards): the finger crosses F at
  // Q1 and Q2; counterclockwise Q1 = [ea, fb, eb, fa], Q2 = [E, F, eb, fb], rotated so that the
  // under-strand sits at slots a and c (assemble fixes which end is incoming).
  const [q1, q2] = eOver ? [[fb, eb, fa, ea], [F, eb, fb, E]] : [[ea, fb, eb, fa], [E, F, eb, fb]];
  pd.push(q1, q2);
  const hints = new Map<number, Slot>();
  for (const [label, h] of heads) if (label !== E && label !== F) hints.set(label, h);
  const here = (l: number) => heads.get(l)!.crossing === crossing && heads.get(l)!.position === (l === E ? position : q);
  // An edge entering the crossing now does so as its near piece; otherwise its far end is unchanged.
  for (const [l, near] of [[E, ea], [F, fa]] as const) {
    if (here(l)) hints.set(near, { crossing, position: l === E ? position : q });
    else hints.set(l, heads.get(l)!);
  }
  return assemble(pd as unknown as Crossing[], hints, framed, unknotFramings);
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
