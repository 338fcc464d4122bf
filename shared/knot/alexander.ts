// Alexander polynomial from the Fox derivatives of the Wirtinger presentation with every
// meridian sent to t (R. H. Fox, "Free differential calculus II", Ann. Math. 1954; Lickorish,
// An Introduction to Knot Theory, ch. 6 and 11): any first minor of the crossings x arcs
// matrix is Delta up to a unit +-t^k, computed exactly by Bareiss elimination over Z[t].
// Normalisation (Conway): exponents symmetric about 0 (halves for an even number of
// components) and the sign fixed by the first Conway coefficient a_{c-1}, which is 1 for a
// knot and, for c components, any cofactor of the linking-number Laplacian (J. Hoste, "The
// first coefficient of the Conway polynomial", Proc. AMS 95, 1985). When that cofactor is 0
// (e.g. the Whitehead link, the Borromean rings) the sign is a convention: the lowest nonzero
// Conway coefficient is made positive, and `conwaySign` is false.
import { Laurent } from '@/shared/poly/laurent';
import { determinant, integers } from './bareiss';
import { Diagram } from './diagram';
import { addPoly, IntPoly, intPoly, polynomials } from './int-poly';
import { linkingMatrix } from './linking';
import { orient } from './pd';
import { arcsOf } from './wirtinger';

export interface Alexander {
  readonly polynomial: Laurent;
  /** True when the sign is Conway's; false when it is only our convention (see above). */
  readonly conwaySign: boolean;
}

export function alexander(d: Diagram): Alexander {
  const o = orient(d.pd);
  const components = o.components.length + d.unknots;
  if (d.pd.length === 0) return { polynomial: components === 1 ? Laurent.one : Laurent.zero, conwaySign: true };
  const arcs = arcsOf(o);
  // Free unknots or a component that only passes over: the link is split.
  if (d.unknots > 0 || arcs.count !== d.pd.length) return { polynomial: Laurent.zero, conwaySign: true };

  const t = intPoly(0, 1);
  const minusOne = intPoly(-1);
  const m: IntPoly[][] = d.pd.map(() => new Array<IntPoly>(arcs.count).fill([]));
  arcs.relations.forEach((r, row) => {
    const add = (col: number, p: IntPoly) => (m[row][col] = addPoly(m[row][col], p));
    add(r.over, intPoly(1, -1));
    add(r.into, r.sign > 0 ? t : minusOne);
    add(r.out, r.sign > 0 ? minusOne : t);
  });
  const minor = determinant(polynomials, m.slice(1).map((row) => row.slice(1)));
  if (minor.length === 0) return { polynomial: Laurent.zero, conwaySign: true };

  const hoste = hosteCoefficient(linkingMatrix(d));
  const order = taylorOrder(minor, components - 1);
  if (order.k !== components - 1 ? hoste !== 0n : order.value * order.value !== hoste * hoste) {
    throw new Error(`internal: Alexander minor disagrees with the linking numbers (Hoste coefficient ${hoste})`);
  }
  const sign = (hoste !== 0n ? hoste : 1n) * (order.value > 0n ? 1n : -1n) > 0n ? 1n : -1n;
  const low = minor.findIndex((c) => c !== 0n);
  const centre = (low + minor.length - 1) / 2;
  return {
    polynomial: Laurent.fromPairs(minor.map((c, i) => [i - centre, sign * c] as const)),
    conwaySign: hoste !== 0n,
  };
}

// a_{c-1}: the determinant of the Laplacian of the linking numbers without its first row and column.
function hosteCoefficient(lk: number[][]): bigint {
  const laplacian = lk.map((row, i) =>
    row.map((v, j) => BigInt(i === j ? row.reduce((s, x, k) => (k === i ? s : s + x), 0) : -v)),
  );
  return determinant(integers, laplacian.slice(1).map((row) => row.slice(1)));
}

// The first nonzero Taylor coefficient of p at t = 1, from order `from` on. Multiplying by a
// unit t^k does not change it, and it equals the lowest nonzero Conway coefficient.
function taylorOrder(p: IntPoly, from: number): { k: number; value: bigint } {
  for (let k = from; ; k++) {
    let value = 0n;
    p.forEach((c, i) => (value += c * binomial(i, k)));
    if (value !== 0n) return { k, value };
    if (k > p.length) throw new Error('internal: nonzero polynomial with vanishing Taylor expansion');
  }
}

function binomial(n: number, k: number): bigint {
  if (k > n) return 0n;
  let r = 1n;
  for (let i = 1; i <= k; i++) r = (r * BigInt(n - k + i)) / BigInt(i);
  return r;
}
