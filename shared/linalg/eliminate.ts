// Sparse Gaussian elimination on unit pivots with a Markowitz-style choice (Markowitz, "The
// elimination form of the inverse", Management Science 3, 1957: shortest row, then shortest
// column) to limit fill-in. Over a field it computes the rank; over Z it removes every
// unit pivot and leaves the rest (entries that are not units) for the Smith form.

import { Ring } from './ring';
import { Sparse } from './sparse';

export interface Eliminated<T> {
  /** Number of unit pivots removed. */
  readonly pivots: number;
  /** The remaining nonzero rows, none of whose entries is a unit. */
  readonly rest: Map<number, T>[];
}

export function eliminateUnits<T>(ring: Ring<T>, m: Sparse<T>): Eliminated<T> {
  const rows = m.entries.map((r) => new Map(r));
  const colRows = Array.from({ length: m.cols }, () => new Set<number>());
  rows.forEach((r, i) => r.forEach((_, c) => colRows[c].add(i)));
  const alive = rows.map((r) => r.size > 0);

  // Min-heap of [length, row]; stale entries are skipped when popped.
  const heap: [number, number][] = [];
  const push = (item: [number, number]): void => {
    heap.push(item);
    for (let i = heap.length - 1; i > 0; ) {
      const p = (i - 1) >> 1;
      if (heap[p][0] <= heap[i][0]) break;
      [heap[p], heap[i]] = [heap[i], heap[p]];
      i = p;
    }
  };
  const pop = (): [number, number] => {
    const top = heap[0];
    const last = heap.pop()!;
    if (heap.length > 0) {
      heap[0] = last;
      for (let i = 0; ; ) {
        const l = 2 * i + 1;
        const r = l + 1;
        let s = i;
        if (l < heap.length && heap[l][0] < heap[s][0]) s = l;
        if (r < heap.length && heap[r][0] < heap[s][0]) s = r;
        if (s === i) break;
        [heap[s], heap[i]] = [heap[i], heap[s]];
        i = s;
      }
    }
    return top;
  };
  rows.forEach((r, i) => r.size > 0 && push([r.size, i]));

  let pivots = 0;
  while (heap.length > 0) {
    const [len, r] = pop();
    if (!alive[r] || rows[r].size !== len) continue;
    let col = -1;
    for (const [c, v] of rows[r]) {
      if (ring.isUnit(v) && (col < 0 || colRows[c].size < colRows[col].size)) col = c;
    }
    if (col < 0) continue; // no unit in this row now; it is pushed again if it changes
    const pivotRow = rows[r];
    const inv = ring.inv(pivotRow.get(col)!);
    for (const i of [...colRows[col]]) {
      if (i === r) continue;
      const row = rows[i];
      const f = ring.mul(row.get(col)!, inv);
      for (const [c, v] of pivotRow) {
        const next = ring.sub(row.get(c) ?? ring.zero, ring.mul(f, v));
        if (ring.isZero(next)) {
          row.delete(c);
          colRows[c].delete(i);
        } else {
          if (!row.has(c)) colRows[c].add(i);
          row.set(c, next);
        }
      }
      if (row.size === 0) alive[i] = false;
      else push([row.size, i]);
    }
    for (const c of pivotRow.keys()) colRows[c].delete(r);
    colRows[col].clear();
    alive[r] = false;
    pivots++;
  }
  return { pivots, rest: rows.filter((row, i) => alive[i] && row.size > 0) };
}

/** Rank over a field. */
export function rank<T>(field: Ring<T>, m: Sparse<T>): number {
  if (!field.isField) throw new RangeError(`rank() needs a field, got ${field.name}; use smith() over Z`);
  return eliminateUnits(field, m).pivots;
}
