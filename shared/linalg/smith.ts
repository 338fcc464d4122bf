// Smith normal form over Z (e.g. Newman, Integral Matrices, 1972, ch. II): unit pivots are
// removed by sparse elimination, the small remainder is diagonalised by Euclidean row and
// column steps, and the diagonal is regrouped into invariant factors d1 | d2 | ... .

import { eliminateUnits } from './eliminate';
import * as Z from './int';
import { Int } from './int';
import { integers } from './ring';
import { Sparse } from './sparse';

export interface Smith {
  readonly rank: number;
  /** The invariant factors other than 1, ascending, each dividing the next. */
  readonly invariants: Int[];
  /** The same torsion as prime powers, ascending (Z/6 = Z/2 + Z/3 gives [2, 3]). */
  readonly primary: Int[];
}

export function smith(m: Sparse<Int>): Smith {
  const { pivots, rest } = eliminateUnits(integers, m);
  const diagonal = diagonalise(rest);
  const primary = diagonal.flatMap(primePowers).sort((a, b) => Z.sign(Z.sub(a, b)));
  return { rank: pivots + diagonal.length, invariants: invariantFactors(diagonal), primary };
}

// The absolute values of the nonzero diagonal entries of an equivalent diagonal matrix.
function diagonalise(rows: Map<number, Int>[]): Int[] {
  const cols = [...new Set(rows.flatMap((r) => [...r.keys()]))];
  const index = new Map(cols.map((c, i) => [c, i]));
  const a: Int[][] = rows.map((r) => {
    const dense = new Array<Int>(cols.length).fill(0);
    r.forEach((v, c) => (dense[index.get(c)!] = v));
    return dense;
  });
  const out: Int[] = [];
  const liveRows = new Set(a.keys());
  const liveCols = new Set(cols.map((_, i) => i));
  for (;;) {
    let pr = -1;
    let pc = -1;
    for (const i of liveRows) {
      for (const j of liveCols) {
        if (!Z.isZero(a[i][j]) && (pr < 0 || Z.cmpAbs(a[i][j], a[pr][pc]) < 0)) [pr, pc] = [i, j];
      }
    }
    if (pr < 0) return out;
    for (let clean = false; !clean; ) {
      clean = true;
      for (const i of liveRows) {
        if (i === pr || Z.isZero(a[i][pc])) continue;
        const q = Z.divRound(a[i][pc], a[pr][pc]);
        for (const j of liveCols) a[i][j] = Z.sub(a[i][j], Z.mul(q, a[pr][j]));
        if (!Z.isZero(a[i][pc])) [pr, clean] = [i, false];
      }
      for (const j of liveCols) {
        if (j === pc || Z.isZero(a[pr][j])) continue;
        const q = Z.divRound(a[pr][j], a[pr][pc]);
        for (const i of liveRows) a[i][j] = Z.sub(a[i][j], Z.mul(q, a[i][pc]));
        if (!Z.isZero(a[pr][j])) [pc, clean] = [j, false];
      }
    }
    out.push(Z.abs(a[pr][pc]));
    liveRows.delete(pr);
    liveCols.delete(pc);
  }
}

/** n = p1^e1 ... as [p1^e1, ...] in increasing p; 1 gives []. Trial division: torsion orders here are small. */
export function primePowers(n: Int): Int[] {
  return factor(n).map(([, power]) => power);
}

function factor(n: Int): [Int, Int][] {
  const out: [Int, Int][] = [];
  let rest = Z.abs(n);
  for (let p: Int = 2; Z.cmpAbs(Z.mul(p, p), rest) <= 0; p = Z.add(p, 1)) {
    let power: Int = 1;
    while (Z.isZero(Z.rem(rest, p))) {
      power = Z.mul(power, p);
      rest = Z.divExact(rest, p);
    }
    if (power !== 1) out.push([p, power]);
  }
  if (rest !== 1) out.push([rest, rest]);
  return out;
}

/** Groups the prime powers of the diagonal entries into invariant factors d1 | d2 | ... (ascending). */
function invariantFactors(diagonal: Int[]): Int[] {
  const byPrime = new Map<string, Int[]>();
  for (const [p, power] of diagonal.flatMap(factor)) byPrime.set(p.toString(), [...(byPrime.get(p.toString()) ?? []), power]);
  const lists = [...byPrime.values()].map((l) => l.sort((a, b) => Z.sign(Z.sub(b, a))));
  const count = Math.max(0, ...lists.map((l) => l.length));
  const out: Int[] = [];
  for (let k = 0; k < count; k++) out.push(lists.reduce<Int>((acc, l) => (k < l.length ? Z.mul(acc, l[k]) : acc), 1));
  return out.reverse();
}
