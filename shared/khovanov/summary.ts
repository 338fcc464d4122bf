// What a Khovanov table says at a glance: the Poincare polynomial, the graded Euler
// characteristic (compared with the Jones polynomial), the homological width and thinness.

import { Laurent } from '../poly/laurent';
import { KhGroup } from './homology';

/** Terms [i, j, rank]: the Poincare polynomial sum rank h^i q^j (ranks of the free parts over Z). */
export function poincare(groups: readonly KhGroup[]): [number, number, number][] {
  return groups.filter((g) => g.free > 0).map((g) => [g.i, g.j, g.free]);
}

/** sum (-1)^i rank q^j; over a field dimensions give the same value (torsion cancels). */
export function eulerCharacteristic(groups: readonly KhGroup[]): Laurent {
  return Laurent.fromPairs(groups.map((g) => [g.j, g.i % 2 === 0 ? g.free : -g.free]));
}

/**
 * What the Euler characteristic must be: (q + q^-1) V for unreduced, V for reduced homology,
 * with t^(1/2) = -q (Bar-Natan 2002, arXiv math/0201043).
 */
export function expectedEuler(jones: Laurent, reduced: boolean): Laurent {
  const v = Laurent.fromPairs(jones.toPairs().map(([e, c]) => [2 * e, Number.isInteger(e) ? c : -c]));
  return reduced ? v : v.mul(Laurent.fromPairs([[1, 1], [-1, 1]]));
}

/** Number of diagonals j - 2i that carry a nonzero group (free or torsion). */
export function width(groups: readonly KhGroup[]): number {
  if (groups.length === 0) return 0;
  const deltas = groups.map((g) => g.j - 2 * g.i);
  return (Math.max(...deltas) - Math.min(...deltas)) / 2 + 1;
}
