// The exact linear algebra under the classical invariants, each against a simple reference:
// Bareiss determinants against Laplace expansion, over Z and Z[t]; the congruence signature
// against Descartes' rule of signs on the characteristic polynomial (exact for symmetric
// matrices, whose eigenvalues are all real), computed by Faddeev-LeVerrier.
import fc from 'fast-check';
import { determinant, integers, ExactDomain } from '@/shared/knot/bareiss';
import { IntPoly, polynomials } from '@/shared/knot/int-poly';
import { signature } from '@/shared/knot/symmetric';

function laplace<T>(ring: ExactDomain<T>, m: readonly (readonly T[])[]): T {
  if (m.length === 0) return ring.one;
  return m[0].reduce((sum, a, j) => {
    const minor = m.slice(1).map((row) => row.filter((_, k) => k !== j));
    const term = ring.mul(a, laplace(ring, minor));
    return j % 2 === 0 ? ring.sub(sum, ring.neg(term)) : ring.sub(sum, term);
  }, ring.zero);
}

// Coefficients c_0..c_n of det(x I - A) (Faddeev-LeVerrier; every division is exact over Z).
function characteristic(a: bigint[][]): bigint[] {
  const n = a.length;
  const c = new Array<bigint>(n + 1).fill(0n);
  c[n] = 1n;
  let m = a.map((row) => row.map(() => 0n));
  for (let k = 1; k <= n; k++) {
    const next = a.map((row, i) => row.map((_, j) => m.reduce((s, _, l) => s + a[i][l] * m[l][j], 0n) + (i === j ? c[n - k + 1] : 0n)));
    m = next;
    const trace = a.reduce((s, row, i) => s + row.reduce((t, x, l) => t + x * m[l][i], 0n), 0n);
    c[n - k] = -trace / BigInt(k);
  }
  return c;
}

const signChanges = (cs: bigint[]) => {
  const nz = cs.filter((x) => x !== 0n);
  return nz.slice(1).filter((x, i) => (x > 0n) !== (nz[i] > 0n)).length;
};

function descartesSignature(a: bigint[][]): number {
  const c = characteristic(a);
  const positive = signChanges(c);
  const negative = signChanges(c.map((x, i) => (i % 2 === 0 ? x : -x)));
  return positive - negative;
}

const arbSquare = (max: number) =>
  fc.integer({ min: 0, max }).chain((n) => fc.array(fc.array(fc.bigInt({ min: -4n, max: 4n }), { minLength: n, maxLength: n }), { minLength: n, maxLength: n }));

describe('exact linear algebra', () => {
  it('Bareiss over Z agrees with Laplace expansion', () => {
    fc.assert(fc.property(arbSquare(6), (m) => expect(determinant(integers, m)).toBe(laplace(integers, m))), { numRuns: 300 });
  });

  it('Bareiss over Z[t] agrees with Laplace expansion', () => {
    const arbPoly = fc.array(fc.bigInt({ min: -3n, max: 3n }), { maxLength: 3 }).map((cs) => polynomials.sub(cs, []) as IntPoly);
    const arbMatrix = fc.integer({ min: 0, max: 4 }).chain((n) => fc.array(fc.array(arbPoly, { minLength: n, maxLength: n }), { minLength: n, maxLength: n }));
    fc.assert(fc.property(arbMatrix, (m) => expect(determinant(polynomials, m)).toEqual(laplace(polynomials, m))), { numRuns: 200 });
  });

  it('the signature agrees with Descartes on the characteristic polynomial, zero diagonals included', () => {
    const arbSymmetric = arbSquare(6).chain((m) =>
      fc.boolean().map((zeroDiagonal) => m.map((row, i) => row.map((x, j) => (i === j ? (zeroDiagonal ? 0n : x) : i < j ? x : m[j][i])))),
    );
    fc.assert(fc.property(arbSymmetric, (m) => expect(signature(m)).toBe(descartesSignature(m))), { numRuns: 300 });
    expect(signature([[0n, 1n], [1n, 0n]])).toBe(0); // hyperbolic plane (common practice)
    expect(signature([[-2n, 1n], [1n, -2n]])).toBe(-2); // V + V^T of the positive trefoil, Lickorish ch. 6
  });
});
