// Disjoint union: the diagrams side by side, labels of the second shifted past the first.

import { assemble, directions, Framed } from '../assemble';
import { Diagram } from '../diagram';
import { mapLabels, PDCode, Slot } from '../pd';

export interface SideBySide {
  pd: PDCode;
  heads: Map<number, Slot>;
  framed: [Framed[], Framed[]];
  unknotFramings: [(number | null)[], (number | null)[]];
}

/** Both diagrams in one code, with the directions and framings of each. */
export function sideBySide(d1: Diagram, d2: Diagram): SideBySide {
  const a = directions(d1);
  const b = directions(d2);
  const shift = Math.max(0, ...d1.pd.flat());
  const n = d1.pd.length;
  const pd = [...d1.pd, ...d2.pd.map((x) => mapLabels(x, (l) => l + shift))];
  const heads = new Map<number, Slot>(a.heads);
  for (const [l, h] of b.heads) heads.set(l + shift, { crossing: h.crossing + n, position: h.position });
  return {
    pd,
    heads,
    framed: [a.framed, b.framed.map((f) => ({ ...f, label: f.label + shift }))],
    unknotFramings: [a.unknotFramings, b.unknotFramings],
  };
}

export function disjointUnion(d1: Diagram, d2: Diagram): Diagram {
  const s = sideBySide(d1, d2);
  return assemble(s.pd, s.heads, s.framed.flat(), s.unknotFramings.flat());
}
