// Dowker-Thistlethwaite code of a knot (C. H. Dowker and M. B. Thistlethwaite, "Classification
// of knot projections", Topology Appl. 16, 1983). Passes are numbered 1..2n along the knot; the
// code lists, for 1, 3, ..., 2n-1, the even number met at the same crossing, negated when the
// even pass goes over. The code fixes the diagram only up to reflection; we take the
// reflection in which, at the crossing of pass 1, the even strand crosses from right to left.
// Realising a code searches the 2^(n-1) choices of the other crossings' handedness for a planar
// one (fine for table-sized knots, capped at MAX_DT_CROSSINGS); for composite knots the first
// planar choice found is returned.

import { Diagram, unknot } from './diagram';
import { fromGauss, toGauss } from './gauss';
import { PDError } from './pd';

export const MAX_DT_CROSSINGS = 18;

export function parseDT(text: string): number[] {
  const parts = text.trim().split(/[\s,]+/).filter((s) => s !== '');
  return parts.map((s) => {
    if (!/^-?\d+$/.test(s)) throw new PDError(`DT entry "${s}" is not an integer`);
    return Number(s);
  });
}

function checkDT(code: readonly number[]): void {
  const n = code.length;
  const seen = new Set<number>();
  code.forEach((e, i) => {
    const a = Math.abs(e);
    if (!Number.isInteger(e) || a % 2 !== 0 || a < 2 || a > 2 * n) throw new PDError(`DT entry ${i + 1} must be an even number between 2 and ${2 * n} up to sign, got ${e}`);
    if (seen.has(a)) throw new PDError(`DT entry ${a} appears twice`);
    seen.add(a);
  });
}

/** The knot of a DT code; the empty code is the unknot. */
export function fromDT(code: readonly number[]): Diagram {
  checkDT(code);
  const n = code.length;
  if (n === 0) return unknot;
  if (n > MAX_DT_CROSSINGS) throw new PDError(`DT codes are realised up to ${MAX_DT_CROSSINGS} crossings, this one has ${n}`);
  // passes[p - 1] = signed crossing number of pass p (Gauss convention: + over, - under)
  const passes = new Array<number>(2 * n);
  code.forEach((e, k) => {
    const evenOver = e < 0;
    passes[2 * k] = evenOver ? -(k + 1) : k + 1;
    passes[Math.abs(e) - 1] = evenOver ? k + 1 : -(k + 1);
  });
  // handedness[k] = +1: the even strand crosses the odd one from right to left. The crossing
  // sign is positive exactly when the under-strand crosses the over-strand from right to left.
  for (let mask = 0; mask < 2 ** (n - 1); mask++) {
    const signs = code.map((e, k) => (k > 0 && (mask >> (k - 1)) & 1 ? -1 : 1) * Math.sign(e));
    try {
      return fromGauss({ components: [passes], signs });
    } catch (err) {
      if (!(err instanceof PDError && /not planar/.test(err.message))) throw err;
    }
  }
  throw new PDError('this DT code is not realisable by a planar knot diagram');
}

/** The DT code of a knot diagram (one component), in the reflection convention above. */
export function toDT(d: Diagram): number[] {
  const { components, signs } = toGauss(d);
  if (components.length !== 1) throw new PDError(`a DT code describes a knot; this diagram has ${components.length} components`);
  const passes = components[0];
  if (passes.length === 0) return [];
  // Start at pass 1 of the traversal; if the convention at that crossing fails, start at its
  // other pass instead, which swaps the roles of the two strands there.
  const code = dtFrom(passes, signs, 0);
  if (code) return code;
  const partner = passes.findIndex((p, i) => i > 0 && Math.abs(p) === Math.abs(passes[0]));
  return dtFrom(passes, signs, partner)!;
}

function dtFrom(passes: readonly number[], signs: readonly number[], start: number): number[] | undefined {
  const m = passes.length;
  const number = new Map<number, number[]>(); // crossing -> its pass numbers
  for (let i = 0; i < m; i++) {
    const c = Math.abs(passes[(start + i) % m]);
    number.set(c, [...(number.get(c) ?? []), i + 1]);
  }
  const code = new Array<number>(m / 2);
  let ok = true;
  for (const [c, [p, q]] of number) {
    if ((p + q) % 2 === 0) throw new PDError('the diagram is not planar: a crossing is met twice at passes of equal parity');
    const [odd, even] = p % 2 === 1 ? [p, q] : [q, p];
    const evenPass = passes[(start + even - 1) % m];
    const evenOver = evenPass > 0;
    const handed = signs[c - 1] * (evenOver ? -1 : 1);
    if (odd === 1 && handed !== 1) ok = false;
    code[(odd - 1) / 2] = evenOver ? -even : even;
  }
  return ok ? code : undefined;
}
