// Signature of a symmetric integer matrix by congruence: symmetric fraction-free elimination
// (Bareiss, Math. Comp. 1968, on diagonal pivots; Sylvester's law of inertia keeps the count).
// When every remaining diagonal entry is zero, adding row/column j to row/column i (a
// unimodular congruence) makes the pivot 2*m[i][j] nonzero.

/** Number of positive minus number of negative eigenvalues. */
export function signature(matrix: readonly (readonly bigint[])[]): number {
  const m = matrix.map((row) => [...row]);
  const active = m.map((_, i) => i);
  const sign = (x: bigint) => (x > 0n ? 1 : -1);
  let previous = 1n;
  let total = 0;
  while (active.length > 0) {
    let p = active.find((i) => m[i][i] !== 0n);
    if (p === undefined) {
      const pair = active.flatMap((i) => active.filter((j) => m[i][j] !== 0n).map((j) => [i, j])).at(0);
      if (!pair) break;
      const [i, j] = pair;
      for (const k of active) m[i][k] += m[j][k];
      for (const k of active) m[k][i] += m[k][j];
      p = i;
    }
    const pivot = m[p][p];
    // The true pivot of the congruence is pivot / previous.
    total += sign(pivot) * sign(previous);
    active.splice(active.indexOf(p), 1);
    for (const r of active) {
      for (const s of active) m[r][s] = (pivot * m[r][s] - m[r][p] * m[p][s]) / previous;
    }
    previous = pivot;
  }
  return total;
}
