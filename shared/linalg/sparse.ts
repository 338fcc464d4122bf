// Sparse matrices as a list of rows, each row a map from column to a nonzero entry.

export interface Sparse<T> {
  readonly rows: number;
  readonly cols: number;
  readonly entries: readonly ReadonlyMap<number, T>[];
}

/** Builds a rows x cols matrix from (row, col, value) triples; repeated positions are summed. */
export function sparse<T>(
  rows: number,
  cols: number,
  triples: Iterable<readonly [number, number, T]>,
  add: (a: T, b: T) => T,
  isZero: (a: T) => boolean,
): Sparse<T> {
  const entries = Array.from({ length: rows }, () => new Map<number, T>());
  for (const [r, c, v] of triples) {
    if (r < 0 || r >= rows || c < 0 || c >= cols) throw new RangeError(`entry (${r}, ${c}) outside a ${rows} x ${cols} matrix`);
    const row = entries[r];
    const s = row.has(c) ? add(row.get(c)!, v) : v;
    if (isZero(s)) row.delete(c);
    else row.set(c, s);
  }
  return { rows, cols, entries };
}
