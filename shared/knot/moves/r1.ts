// Reidemeister I: a kink added on an edge, or a kink (a crossing with one edge from a slot to
// the next) removed.

import { assemble, directions } from '../assemble';
import { Diagram } from '../diagram';
import { Crossing, orient, PDError, Slot, writablePD } from '../pd';
import { splice } from './splice';

export interface Kink {
  /** Sign of the new crossing. */
  sign: 1 | -1;
  /** Whether the strand first passes over (then loops round under itself) or under. */
  overFirst: boolean;
}

/** Adds a kink near the head of edge `label`. */
export function addKink(d: Diagram, label: number, kink: Kink): Diagram {
  const { heads, framed, unknotFramings } = directions(d);
  const head = heads.get(label);
  if (!head) throw new PDError(`there is no edge ${label}`);
  const loop = Math.max(...d.pd.flat()) + 1;
  const out = loop + 1;
  const k = d.pd.length;
  // The strand arrives on `label`, goes round the loop and leaves on `out` (docs/conventions.md, PD code).
  const [x, into]: [Crossing, number] = kink.overFirst
    ? kink.sign > 0 ? [[loop, loop, out, label], 3] : [[loop, label, out, loop], 1]
    : kink.sign > 0 ? [[label, out, loop, loop], 0] : [[label, loop, loop, out], 0];
  const pd = writablePD(d.pd);
  pd[head.crossing][head.position] = out;
  pd.push([...x]);
  const hints = new Map<number, Slot>(heads);
  hints.set(out, head);
  hints.set(label, { crossing: k, position: into });
  hints.delete(loop);
  return assemble(pd, hints, framed, unknotFramings);
}

/** Crossings where some edge runs from one slot to the next: the removable kinks. */
export function kinks(d: Diagram): number[] {
  return d.pd.flatMap((x, i) => (x.some((l, p) => l === x[(p + 1) % 4]) ? [i] : []));
}

export function removeKink(d: Diagram, crossing: number): Diagram {
  const x = d.pd[crossing];
  if (!x) throw new PDError(`there is no crossing ${crossing + 1}`);
  const p = x.findIndex((l, q) => l === x[(q + 1) % 4]);
  if (p < 0) throw new PDError(`crossing ${crossing + 1} is not a kink`);
  const o = orient(d.pd);
  const [u, v] = [x[(p + 2) % 4], x[(p + 3) % 4]];
  // Of the two other edges, the one whose head is here enters the kink.
  const h = o.head.get(u)!;
  const entering = h.crossing === crossing && h.position === (p + 2) % 4 ? u : v;
  return splice(d, [crossing], [[entering, entering === u ? v : u]]);
}
