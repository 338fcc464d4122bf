// Removing crossings and joining the strands that ran through them: shared by the moves that
// take crossings away (R1 and R2 undone) and by deleting components (sublinks).

import { assemble, Framed } from '../assemble';
import { Diagram } from '../diagram';
import { labelClasses } from '../label-classes';
import { mapLabels, orient, PDCode, PDError, Slot, slotsOf } from '../pd';

/**
 * Removes the crossings `remove`; each pair in `joins` is (label entering the removed part,
 * label leaving it) along one strand, joined into one edge. Labels with both ends in removed
 * crossings vanish; a joined strand with no crossing left becomes a crossingless unknot. The
 * PD components in `dropped` are deleted (all their crossings must be removed).
 */
export function splice(d: Diagram, remove: readonly number[], joins: readonly (readonly [number, number])[], dropped: readonly number[] = []): Diagram {
  const o = orient(d.pd);
  const slots = slotsOf(d.pd);
  const gone = new Set(remove);
  const { pd, find } = joinedCode(d.pd, remove, joins);
  const joined = new Set(joins.flat());
  const kept = d.pd.map((_, i) => i).filter((i) => !gone.has(i));
  const index = new Map(kept.map((old, i) => [old, i]));
  const heads = new Map<number, Slot>();
  for (const [label, h] of o.head) {
    if (index.has(h.crossing)) heads.set(find(label), { crossing: index.get(h.crossing)!, position: h.position });
  }
  // Anchor every component at a label still present; a vanished one becomes an unknot.
  const present = new Set(pd.flat());
  const framed: Framed[] = [];
  const unknotFramings = [...d.framings.slice(o.components.length)];
  o.components.forEach((labels, c) => {
    if (dropped.includes(c)) return;
    const anchor = labels.map(find).find((l) => present.has(l));
    if (anchor !== undefined) framed.push({ label: anchor, framing: d.framings[c] });
    else if (labels.some((l) => joined.has(l))) unknotFramings.push(d.framings[c]);
    else throw new PDError(`splice: component ${c + 1} would vanish without closing up`);
  });
  for (const [label, list] of slots) {
    const inside = list.filter((s) => gone.has(s.crossing)).length;
    if (inside === 1 && !joined.has(label)) throw new PDError(`splice: edge ${label} is cut but not joined`);
  }
  return assemble(pd, heads, framed, unknotFramings);
}

/**
 * The crossings not in `remove`, in order and at their slots, with the labels of each pair in
 * `joins` made one (each class named by one of its labels). Orientation is neither needed nor
 * kept, so this also serves smoothings.
 */
export function joinedCode(pd: PDCode, remove: readonly number[], joins: readonly (readonly [number, number])[]): { pd: PDCode; find: (l: number) => number } {
  const { find, join } = labelClasses();
  for (const [a, b] of joins) join(a, b);
  return { pd: pd.flatMap((x, i) => (remove.includes(i) ? [] : [mapLabels(x, (l) => find(l))])), find };
}
