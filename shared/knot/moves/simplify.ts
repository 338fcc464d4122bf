// Greedy simplification: remove R1 kinks and R2 bigons until none is left. It never adds
// crossings, so it stops; it does not find every simplification (no R3, no global search).

import { Diagram } from '../diagram';
import { kinks, removeKink } from './r1';
import { bigons, removeBigon } from './r2';

/** One removal: the diagram after it and the crossings it took out (by their index before it). */
export interface Removal {
  diagram: Diagram;
  removed: number[];
}

/** The removals simplify makes, in order (kinks first, then bigons). */
export function simplifySteps(d: Diagram): Removal[] {
  const steps: Removal[] = [];
  for (let current = d; ; current = steps[steps.length - 1].diagram) {
    const k = kinks(current);
    if (k.length) {
      steps.push({ diagram: removeKink(current, k[0]), removed: [k[0]] });
      continue;
    }
    const b = bigons(current);
    if (!b.length) return steps;
    steps.push({ diagram: removeBigon(current, b[0]), removed: [...b[0].crossings].sort((p, q) => p - q) });
  }
}

export function simplify(d: Diagram): Diagram {
  const steps = simplifySteps(d);
  return steps.length ? steps[steps.length - 1].diagram : d;
}
