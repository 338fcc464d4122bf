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

// The absolute values of the nonzero diagonal entries of an equivalent diagonal matrix, by
// sparse Euclidean steps: the pivot is a smallest entry; its column is cleared by row steps and
// then its row by column steps (which, the column being clear, touch the pivot row only); a
// nonzero remainder becomes the new, smaller pivot.
function diagonalise(input: Map<number, Int>[]): Int[] {
  const { isZero, sub, mul, divRound, cmpAbs, abs } = Z;
  const rows = input.map((r) => new Map(r));
  const colRows = new Map<number, Set<number>>();
  rows.forEach((r, i) => r.forEach((_, c) => (colRows.get(c) ?? colRows.set(c, new Set()).get(c)!).add(i)));
  const set = (i: number, c: number, v: Int): void => {
    if (isZero(v)) {
      rows[i].delete(c);
      colRows.get(c)!.delete(i);
    } else {
      rows[i].set(c, v);
      colRows.get(c)!.add(i);
    }
  };
  // Entries alone in their row and column are diagonal already (after unit elimination most
  // are: thin knots leave a diagonal of 2s), so they are taken out before the quadratic search.
  const out: Int[] = [];
  rows.forEach((r, i) => {
    if (r.size !== 1) return;
    const [[c, v]] = r;
    if (colRows.get(c)!.size !== 1) return;
    out.push(abs(v));
    set(i, c, 0);
  });
  for (;;) {
    let pr = -1;
    let pc = -1;
    // Any nonzero pivot is correct (the steps below shrink it as needed); a smallest one saves
    // steps, and with the units eliminated an entry of absolute value 2 nearly always is one.
    search: for (let i = 0; i < rows.length; i++) {
      for (const [c, v] of rows[i]) {
        if (pr < 0 || cmpAbs(v, rows[pr].get(pc)!) < 0) [pr, pc] = [i, c];
        if (cmpAbs(v, 2) === 0) break search;
      }
    }
    if (pr < 0) return out;
    for (let clean = false; !clean; ) {
      clean = true;
      const p = rows[pr].get(pc)!;
      for (const i of [...colRows.get(pc)!]) {
        if (i === pr) continue;
        const q = divRound(rows[i].get(pc)!, p);
        for (const [c, v] of rows[pr]) set(i, c, sub(rows[i].get(c) ?? 0, mul(q, v)));
      }
      const remainders = [...colRows.get(pc)!].filter((i) => i !== pr);
      if (remainders.length > 0) {
        pr = remainders.reduce((best, i) => (cmpAbs(rows[i].get(pc)!, rows[best].get(pc)!) < 0 ? i : best));
        clean = false;
        continue;
      }
      for (const [c, v] of [...rows[pr]]) {
        if (c !== pc) set(pr, c, sub(v, mul(divRound(v, p), p)));
      }
      const left = [...rows[pr].keys()].filter((c) => c !== pc);
      if (left.length > 0) {
        pc = left.reduce((best, c) => (cmpAbs(rows[pr].get(c)!, rows[pr].get(best)!) < 0 ? c : best));
        clean = false;
      }
    }
    out.push(abs(rows[pr].get(pc)!));
    set(pr, pc, 0);
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
  for (const [p, power] of diagonal.flatMap(factor)) {
    const key = p.toString();
    const list = byPrime.get(key) ?? byPrime.set(key, []).get(key)!;
    list.push(power);
  }
  const lists = [...byPrime.values()].map((l) => l.sort((a, b) => Z.sign(Z.sub(b, a))));
  const count = Math.max(0, ...lists.map((l) => l.length));
  const out: Int[] = [];
  for (let k = 0; k < count; k++) out.push(lists.reduce<Int>((acc, l) => (k < l.length ? Z.mul(acc, l[k]) : acc), 1));
  return out.reverse();
}
