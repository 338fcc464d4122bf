// Building a diagram from crossings made by a construction (families, moves): the edge
// directions the construction intends are passed as hints, so components that only pass over
// keep their direction, and framings follow the components through anchor labels.

import { Diagram, diagram } from './diagram';
import { Crossing, orient, PDCode, PDError, relabel, Slot, slotsOf } from './pd';

export interface Framed {
  /** A label of the component in the constructed code. */
  readonly label: number;
  readonly framing: number | null;
}

/**
 * `heads` gives the head slot (where the edge enters a crossing) of at least one label of every
 * component that only passes over; incoming under-strands are read from the code. Labels are
 * then renumbered along travel. Components not named in `framed` get the blackboard framing;
 * `unknotFramings` frames the crossingless unknots, one entry each.
 */
export function assemble(pd: PDCode, heads: ReadonlyMap<number, Slot>, framed: readonly Framed[], unknotFramings: readonly (number | null)[]): Diagram {
  const slots = slotsOf(pd);
  const hints = new Map(heads);
  pd.forEach((x, crossing) => hints.set(x[0], { crossing, position: 0 }));
  const fresh = new Map<number, number>();
  for (const [start, startHead] of hints) {
    if (fresh.has(start)) continue;
    let label = start;
    let head = startHead;
    while (!fresh.has(label)) {
      fresh.set(label, fresh.size + 1);
      const out: Slot = { crossing: head.crossing, position: (head.position + 2) % 4 };
      label = pd[out.crossing][out.position];
      const [p, q] = slots.get(label)!;
      head = p.crossing === out.crossing && p.position === out.position ? q : p;
    }
  }
  for (const label of slots.keys()) {
    if (!fresh.has(label)) throw new PDError(`construction error: no direction known for the component through edge ${label}`);
  }
  const numbered = pd.map((x) => x.map((l) => fresh.get(l)!) as unknown as Crossing);
  const o = orient(numbered);
  const framings: (number | null)[] = new Array<number | null>(o.components.length).fill(null);
  for (const { label, framing } of framed) framings[o.componentOf.get(fresh.get(label)!)!] = framing;
  return diagram(relabel(o), { unknots: unknotFramings.length, framings: [...framings, ...unknotFramings] });
}

/** Head slots of every label of a diagram, and one anchor label per PD component with its framing. */
export function directions(d: Diagram): { heads: Map<number, Slot>; framed: Framed[]; unknotFramings: (number | null)[] } {
  const o = orient(d.pd);
  const heads = new Map(o.head);
  const framed = o.components.map((labels, i) => ({ label: labels[0], framing: d.framings[i] }));
  return { heads, framed, unknotFramings: d.framings.slice(o.components.length) };
}
