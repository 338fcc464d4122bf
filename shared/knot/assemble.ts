// Building a diagram from crossings made by a construction (families, moves): the edge
// directions the construction intends are passed as hints, so components that only pass over
// keep their direction, and framings follow the components through anchor labels.

import { Diagram, diagram } from './diagram';
import { mapLabels, orient, PDCode, PDError, relabel, rotated, Slot, slotsOf } from './pd';

export interface Framed {
  /** A label of the component in the constructed code. */
  readonly label: number;
  readonly framing: number | null;
}

/**
 * `heads` gives the head slot (where the edge enters a crossing) of at least one label of every
 * component that only passes over; directions then follow along the strands, and elsewhere the
 * under-strand at a -> c decides. A crossing whose under-strand turns out to enter at c is
 * turned by two slots (the same crossing, read from its other incoming end), so constructions
 * may reverse strands freely. Labels are then renumbered along travel. Components not named in
 * `framed` get the blackboard framing; `unknotFramings` frames the crossingless unknots.
 */
export function assemble(pd: PDCode, heads: ReadonlyMap<number, Slot>, framed: readonly Framed[], unknotFramings: readonly (number | null)[]): Diagram {
  const slots = slotsOf(pd);
  const head = new Map<number, Slot>();
  const follow = (start: number, startHead: Slot) => {
    let label = start;
    let h = startHead;
    while (!head.has(label)) {
      head.set(label, h);
      const out: Slot = { crossing: h.crossing, position: (h.position + 2) % 4 };
      label = pd[out.crossing][out.position];
      const [p, q] = slots.get(label)!;
      h = p.crossing === out.crossing && p.position === out.position ? q : p;
    }
  };
  for (const [label, h] of heads) follow(label, h);
  pd.forEach((x, crossing) => {
    if (!head.has(x[0])) follow(x[0], { crossing, position: 0 });
  });
  for (const label of slots.keys()) {
    if (!head.has(label)) throw new PDError(`construction error: no direction known for the component through edge ${label}`);
  }
  const turned = pd.map((x, crossing) => {
    const h = head.get(x[2])!;
    return h.crossing === crossing && h.position === 2 ? rotated(x, 2) : x;
  });
  const turnedHeads = new Map<number, Slot>();
  const tailCrossing = (label: number) => {
    const [p, q] = slots.get(label)!;
    const h = head.get(label)!;
    return (p.crossing === h.crossing && p.position === h.position ? q : p).crossing;
  };
  for (const [label, h] of head) {
    const t = turned[h.crossing] !== pd[h.crossing];
    turnedHeads.set(label, t ? { crossing: h.crossing, position: (h.position + 2) % 4 } : h);
  }
  // Number along travel so that components passing only over read the intended direction.
  const fresh = new Map<number, number>();
  const after = (label: number) => {
    const h = turnedHeads.get(label)!;
    return turned[h.crossing][(h.position + 2) % 4];
  };
  for (const [label] of turnedHeads) {
    if (fresh.has(label)) continue;
    const loop = [label];
    for (let l = after(label); l !== label; l = after(l)) loop.push(l);
    // A two-edge loop reads "increasing" both ways; orient() then leaves the lower-numbered
    // crossing along the smaller label, so give that label to the edge leaving it.
    if (loop.length === 2 && tailCrossing(loop[0]) > tailCrossing(loop[1])) loop.reverse();
    for (const l of loop) fresh.set(l, fresh.size + 1);
  }
  const numbered = turned.map((x) => mapLabels(x, (l) => fresh.get(l)!));
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
