// Connected sum of component i of d1 and component j of d2: the two diagrams side by side and
// the heads of one edge of each swapped, a band along a common outer face. Any edge may be
// used, since any face of a planar diagram can be made the outer one (common practice). The
// joined component's framing is the sum of the two (blackboard framings add), null if either
// is null. Summing with a crossingless unknot removes that unknot.

import { assemble, Framed } from '../assemble';
import { Diagram } from '../diagram';
import { exchangeHeads, orient, PDError } from '../pd';
import { sideBySide } from './union';

export function connectedSum(d1: Diagram, d2: Diagram, i = 0, j = 0): Diagram {
  const c1 = orient(d1.pd).components.length;
  const c2 = orient(d2.pd).components.length;
  if (!Number.isInteger(i) || i < 0 || i >= c1 + d1.unknots) throw new PDError(`the first diagram has no component ${i + 1}`);
  if (!Number.isInteger(j) || j < 0 || j >= c2 + d2.unknots) throw new PDError(`the second diagram has no component ${j + 1}`);
  const s = sideBySide(d1, d2);
  const [f1, f2] = s.framed;
  const [u1, u2] = s.unknotFramings;
  const framing1 = i < c1 ? f1[i].framing : u1[i - c1];
  const framing2 = j < c2 ? f2[j].framing : u2[j - c2];
  const joined = framing1 === null || framing2 === null ? null : framing1 + framing2;
  const without = <T>(list: T[], k: number) => list.filter((_, m) => m !== k);
  if (j >= c2 || i >= c1) {
    // One side is a crossingless unknot: drop it and give the other side the joined framing.
    const framed: Framed[] = [...f1, ...f2];
    const unknots = [...u1, ...u2];
    if (j >= c2) {
      unknots.splice(u1.length + j - c2, 1);
      if (i < c1) framed[i] = { ...f1[i], framing: joined };
      else unknots[i - c1] = joined;
    } else {
      framed[c1 + j] = { ...f2[j], framing: joined };
      unknots.splice(i - c1, 1);
    }
    return assemble(s.pd, s.heads, framed, unknots);
  }
  const e1 = f1[i].label;
  const { pd, heads } = exchangeHeads(s, e1, f2[j].label);
  const framed = [...without(f1, i), ...without(f2, j), { label: e1, framing: joined }];
  return assemble(pd, heads, framed, [...u1, ...u2]);
}
