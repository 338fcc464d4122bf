// Dowker-Thistlethwaite code of a knot (C. H. Dowker and M. B. Thistlethwaite, "Classification
// of knot projections", Topology Appl. 16, 1983). Passes are numbered 1..2n along the knot; the
// code lists, for 1, 3, ..., 2n-1, the even number met at the same crossing, negated when the
// even pass goes over. A code whose crossings are all interlaced (a prime diagram) fixes the
// diagram up to reflection (Dowker and Thistlethwaite, ibid.); we take the reflection in which,
// at the crossing of pass 1, the even strand crosses from right to left. For a composite or
// nugatory diagram each group of interlaced crossings is reflected independently, so the
// summands' chirality is not recorded: fromDT makes the first crossing of each group
// right-to-left, and toDT o fromDT keeps the knot type only for prime diagrams. Realising a code
// searches the handedness of the other crossings for a planar choice (2^(n - groups) tries, so
// it is capped at MAX_DT_CROSSINGS).

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
  // Search all crossings' handedness but the first of each group.
  const free = interlacedGroups(code).flatMap((g) => g.slice(1));
  for (let mask = 0; mask < 2 ** free.length; mask++) {
    const flipped = new Set(free.filter((_, b) => (mask >> b) & 1));
    const signs = code.map((e, k) => (flipped.has(k) ? -1 : 1) * Math.sign(e));
    try {
      return fromGauss({ components: [passes], signs });
    } catch (err) {
      if (!(err instanceof PDError && /not planar/.test(err.message))) throw err;
    }
  }
  throw new PDError('this DT code is not realisable by a planar knot diagram');
}

/**
 * The groups of interlaced crossings (0-based, by odd pass): crossings k and j interlace when
 * exactly one pass of j lies between the two passes of k. One group means a prime diagram.
 */
export function interlacedGroups(code: readonly number[]): number[][] {
  const passes = code.map((e, k) => [2 * k + 1, Math.abs(e)].sort((a, b) => a - b));
  const between = (k: number, p: number) => passes[k][0] < p && p < passes[k][1];
  const group = code.map((_, k) => k);
  const find = (k: number): number => (group[k] === k ? k : (group[k] = find(group[k])));
  code.forEach((_, k) => {
    code.forEach((__, j) => {
      if (between(k, passes[j][0]) !== between(k, passes[j][1])) group[find(j)] = find(k);
    });
  });
  const groups = new Map<number, number[]>();
  code.forEach((_, k) => groups.set(find(k), [...(groups.get(find(k)) ?? []), k]));
  return [...groups.values()];
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
