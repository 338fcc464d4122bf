// Jones polynomial from the Kauffman bracket: V(L) = (-A^3)^(-w) <L> at A = t^(-1/4)
// (Kauffman, "State models and the Jones polynomial", Topology 26, 1987; docs/conventions.md).

import { bracket } from './bracket';
import { Diagram } from './diagram';
import { Laurent } from '@/shared/poly/laurent';
import { orient, writhe } from './pd';

/** The Jones polynomial in t from a bracket already computed for d (the bracket is the costly part). */
export function jonesFromBracket(d: Diagram, b: Laurent): Laurent {
  const w = writhe(orient(d.pd));
  return b.shift(-3 * w).scale(w % 2 === 0 ? 1 : -1).substitute(-0.25);
}

export function jones(d: Diagram): Laurent {
  return jonesFromBracket(d, bracket(d));
}
