// Reversing the orientation of one component (framing unchanged: it does not depend on it).

import { assemble, directions } from '../assemble';
import { Diagram } from '../diagram';
import { orient, PDError, rotated, Slot } from '../pd';

/** `component` is 0-based in the diagram's component order; a crossingless unknot is unchanged. */
export function reverseComponent(d: Diagram, component: number): Diagram {
  const o = orient(d.pd);
  if (!Number.isInteger(component) || component < 0 || component >= o.components.length + d.unknots) throw new PDError(`there is no component ${component + 1}`);
  if (component >= o.components.length) return d;
  const { heads, framed, unknotFramings } = directions(d);
  const mine = new Set(o.components[component]);
  // Where the reversed component passes under, its incoming slot is now c: rotate by two.
  const turned = d.pd.map((x) => mine.has(x[0]));
  const pd = d.pd.map((x, i) => (turned[i] ? rotated(x, 2) : x));
  const shifted = (s: Slot): Slot => ({ crossing: s.crossing, position: turned[s.crossing] ? (s.position + 2) % 4 : s.position });
  const newHeads = new Map<number, Slot>();
  for (const [label, h] of heads) newHeads.set(label, shifted(mine.has(label) ? o.tail.get(label)! : h));
  return assemble(pd, newHeads, framed, unknotFramings);
}
