// Mirror image: every crossing switched, orientation kept, framings negated (common practice).

import { assemble, directions } from '../assemble';
import { Diagram } from '../diagram';
import { orient, rotated } from '../pd';

export function mirror(d: Diagram): Diagram {
  const { heads, framed, unknotFramings } = directions(d);
  const signs = orient(d.pd).signs;
  // The over-strand becomes the under-strand; it runs d -> b at a positive crossing.
  const pd = d.pd.map((x, i) => rotated(x, signs[i] > 0 ? 3 : 1));
  // Slot positions moved with the rotation; re-derive heads from the new code.
  const moved = new Map([...heads].map(([label, h]) => [label, { crossing: h.crossing, position: (h.position + (signs[h.crossing] > 0 ? 1 : 3)) % 4 }]));
  const negate = (f: number | null) => (f === null ? null : -f);
  return assemble(pd, moved, framed.map((x) => ({ ...x, framing: negate(x.framing) })), unknotFramings.map(negate));
}
