// Fox n-colourings: labellings of the arcs by Z/n with 2 * over = in + out at every crossing
// (R. H. Fox, "A quick trip through knot theory", 1962; Lickorish, ch. 3). The count includes
// the n constant colourings; each free unknot multiplies it by n.
import * as Z from '@/shared/linalg/int';
import { smith } from '@/shared/linalg/smith';
import { sparse } from '@/shared/linalg/sparse';
import { Diagram } from './diagram';
import { orient } from './pd';
import { arcsOf } from './wirtinger';

export function colourings(d: Diagram, n: number): bigint {
  const arcs = arcsOf(orient(d.pd));
  const triples = arcs.relations.flatMap((r, row) => [[row, r.over, 2], [row, r.into, -1], [row, r.out, -1]] as const);
  return solutionsModN(arcs.relations.length, arcs.count, triples, n) * BigInt(n) ** BigInt(d.unknots);
}

/**
 * The number of solutions of M x = 0 in (Z/n)^columns, from the Smith form of M: n for each
 * column beyond the rank, gcd(d, n) for each invariant factor d.
 */
export function solutionsModN(rows: number, columns: number, entries: Iterable<readonly [number, number, Z.Int]>, n: number): bigint {
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`n must be a positive integer, got ${n}`);
  const form = smith(sparse(rows, columns, entries, Z.add, Z.isZero));
  let count = BigInt(n) ** BigInt(columns - form.rank);
  for (const x of form.invariants) count *= BigInt(Z.gcd(x, n));
  return count;
}
