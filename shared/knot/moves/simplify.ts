// Greedy simplification: remove R1 kinks and R2 bigons until none is left. It never adds
// crossings, so it stops; it does not find every simplification (no R3, no global search).

import { Diagram } from '../diagram';
import { kinks, removeKink } from './r1';
import { bigons, removeBigon } from './r2';

export function simplify(d: Diagram): Diagram {
  let current = d;
  for (;;) {
    const k = kinks(current);
    if (k.length) {
      current = removeKink(current, k[0]);
      continue;
    }
    const b = bigons(current);
    if (b.length) {
      current = removeBigon(current, b[0]);
      continue;
    }
    return current;
  }
}
