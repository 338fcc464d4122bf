// Fox n-colourings: labellings of the arcs by Z/n with 2 * over = in + out at every crossing
// (R. H. Fox, "A quick trip through knot theory", 1962; Lickorish, ch. 3). The count includes
// the n constant colourings; each free unknot multiplies it by n.
import { Diagram } from './diagram';
import { solutionsModN } from './diagonal';
import { orient } from './pd';
import { arcsOf } from './wirtinger';

export function colourings(d: Diagram, n: number): bigint {
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`n must be a positive integer, got ${n}`);
  const arcs = arcsOf(orient(d.pd));
  const matrix = arcs.relations.map((r) => {
    const row = new Array<bigint>(arcs.count).fill(0n);
    row[r.over] += 2n;
    row[r.into] -= 1n;
    row[r.out] -= 1n;
    return row;
  });
  return solutionsModN(matrix, arcs.count, n) * BigInt(n) ** BigInt(d.unknots);
}
