// Diagonal form of an integer matrix by unimodular row and column operations (the elimination
// half of the Smith normal form, H. J. S. Smith 1861, without the divisibility chain): enough
// to count solutions of M x = 0 over Z/n. (shared/linalg/smith.ts would serve once its rank
// counts the unit pivots found while diagonalising; see the part B report.)

/** |d_1|, ..., |d_r| of an equivalent diagonal matrix, r = min(rows, columns); zeros included. */
export function diagonalForm(matrix: readonly (readonly bigint[])[]): bigint[] {
  const m = matrix.map((row) => [...row]);
  const rows = m.length;
  const cols = rows === 0 ? 0 : m[0].length;
  const abs = (x: bigint) => (x < 0n ? -x : x);
  const out: bigint[] = [];
  for (let t = 0; t < Math.min(rows, cols); t++) {
    for (;;) {
      // The smallest nonzero entry of the remaining block becomes the pivot.
      let best: [number, number] | undefined;
      for (let i = t; i < rows; i++) {
        for (let j = t; j < cols; j++) {
          if (m[i][j] !== 0n && (!best || abs(m[i][j]) < abs(m[best[0]][best[1]]))) best = [i, j];
        }
      }
      if (!best) break;
      [m[t], m[best[0]]] = [m[best[0]], m[t]];
      for (const row of m) [row[t], row[best[1]]] = [row[best[1]], row[t]];
      const pivot = m[t][t];
      let clean = true;
      for (let i = t + 1; i < rows; i++) {
        const q = m[i][t] / pivot;
        if (q !== 0n) for (let j = t; j < cols; j++) m[i][j] -= q * m[t][j];
        if (m[i][t] !== 0n) clean = false;
      }
      for (let j = t + 1; j < cols; j++) {
        const q = m[t][j] / pivot;
        if (q !== 0n) for (let i = t; i < rows; i++) m[i][j] -= q * m[i][t];
        if (m[t][j] !== 0n) clean = false;
      }
      if (clean) break;
    }
    out.push(abs(m[t][t]));
  }
  return out;
}

/** The number of solutions of M x = 0 in (Z/n)^columns. */
export function solutionsModN(matrix: readonly (readonly bigint[])[], columns: number, n: number): bigint {
  const big = BigInt(n);
  const gcd = (a: bigint, b: bigint): bigint => (b === 0n ? a : gcd(b, a % b));
  const diagonal = diagonalForm(matrix);
  let count = big ** BigInt(columns - diagonal.length);
  for (const x of diagonal) count *= gcd(x, big);
  return count;
}
