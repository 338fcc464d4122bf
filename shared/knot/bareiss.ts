// Determinant by fraction-free elimination (E. H. Bareiss, "Sylvester's identity and multistep
// integer-preserving Gaussian elimination", Math. Comp. 22, 1968), over any integral domain
// that can divide exactly: the integers (Goeritz matrices) and Z[t] (Alexander matrices).

/**
 * What fraction-free elimination needs: an integral domain with exact division. Not the
 * coefficient rings of shared/linalg/ring.ts (units, inverses, F_p), which Z[t] is not.
 */
export interface ExactDomain<T> {
  readonly zero: T;
  readonly one: T;
  isZero(a: T): boolean;
  mul(a: T, b: T): T;
  sub(a: T, b: T): T;
  neg(a: T): T;
  /** a / b where b divides a exactly (Bareiss guarantees it). */
  divExact(a: T, b: T): T;
}

export const integers: ExactDomain<bigint> = {
  zero: 0n,
  one: 1n,
  isZero: (a) => a === 0n,
  mul: (a, b) => a * b,
  sub: (a, b) => a - b,
  neg: (a) => -a,
  divExact: (a, b) => a / b,
};

/** The determinant of a square matrix; the empty matrix has determinant one. */
export function determinant<T>(ring: ExactDomain<T>, matrix: readonly (readonly T[])[]): T {
  const m = matrix.map((row) => {
    if (row.length !== matrix.length) throw new RangeError('determinant needs a square matrix');
    return [...row];
  });
  const n = m.length;
  let previous = ring.one;
  let negate = false;
  for (let k = 0; k < n; k++) {
    const pivot = m.findIndex((row, i) => i >= k && !ring.isZero(row[k]));
    if (pivot < 0) return ring.zero;
    if (pivot !== k) {
      [m[k], m[pivot]] = [m[pivot], m[k]];
      negate = !negate;
    }
    for (let i = k + 1; i < n; i++) {
      for (let j = k + 1; j < n; j++) {
        m[i][j] = ring.divExact(ring.sub(ring.mul(m[k][k], m[i][j]), ring.mul(m[i][k], m[k][j])), previous);
      }
    }
    previous = m[k][k];
  }
  const det = n === 0 ? ring.one : m[n - 1][n - 1];
  return negate ? ring.neg(det) : det;
}
