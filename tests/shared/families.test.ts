import fc from 'fast-check';
import { fromBraid } from '@/shared/knot/braid';
import { componentCount, diagram, unknot } from '@/shared/knot/diagram';
import { cable, connectedSum, disjointUnion, mirror, pretzelLink, rationalLink, reverseComponent, sublink, torusLink, twistKnot } from '@/shared/knot/families';
import { jones } from '@/shared/knot/jones';
import { linkingMatrix } from '@/shared/knot/linking';
import { orient } from '@/shared/knot/pd';
import { Laurent } from '@/shared/poly/laurent';
import { arbBraid } from './arbitraries';
import { determinantOf } from './roots';

const V = (pairs: [number, number][]) => Laurent.fromPairs(pairs);
const loop = V([[0.5, -1], [-0.5, -1]]); // -t^(1/2) - t^(-1/2), the two-component unlink

// Jones' torus knot formula (V. F. R. Jones, "Hecke algebra representations of braid groups and
// link polynomials", Ann. of Math. 126, 1987; stated from memory), p, q coprime and positive:
// V(T(p,q)) = t^((p-1)(q-1)/2) (1 - t^(p+1) - t^(q+1) + t^(p+q)) / (1 - t^2).
function jonesTorusKnot(p: number, q: number): Laurent {
  const numerator = V([[0, 1], [p + 1, -1], [q + 1, -1], [p + q, 1]]);
  // Divide by 1 - t^2: the quotient's coefficients c_k = n_k + c_(k-2).
  const top = p + q;
  const c: bigint[] = [];
  for (let k = 0; k <= top - 2; k++) c.push(numerator.coefficient(k) + (k >= 2 ? c[k - 2] : 0n));
  return Laurent.fromDense(c, 0).shift(((p - 1) * (q - 1)) / 2);
}

describe('families', () => {
  it("torus knots match Jones' formula", () => {
    for (const [p, q] of [[2, 3], [2, 5], [3, 4], [3, 5], [2, 7], [4, 5], [3, 7], [5, 6]]) {
      expect(jones(torusLink(p, q)).equals(jonesTorusKnot(p, q))).toBe(true);
      expect(jones(torusLink(q, p)).equals(jonesTorusKnot(p, q))).toBe(true); // T(p,q) = T(q,p) (common practice)
      expect(jones(torusLink(-p, q)).equals(jonesTorusKnot(p, q).substitute(-1))).toBe(true); // the mirror
    }
    expect(componentCount(torusLink(3, 0))).toBe(3);
    expect(componentCount(torusLink(4, 6))).toBe(2); // gcd(4,6) components (common practice)
    expect(() => torusLink(0, 2)).toThrow(/p != 0/);
  });

  it('rational links: the determinant is the numerator of the continued fraction', () => {
    // det of the 2-bridge link b(p, q) is p (Burde and Zieschang, "Knots", ch. 12); |V(-1)| = det (common practice)
    const value = (f: number[]): [number, number] => f.reduceRight<[number, number]>(([p, q], a) => [a * p + q, p], [1, 0]);
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: 4 }), { minLength: 1, maxLength: 4 }), (f) => {
        const [p] = value(f);
        expect(determinantOf(jones(rationalLink(f)))).toBe(BigInt(p));
        expect(componentCount(rationalLink(f))).toBe(p % 2 === 0 ? 2 : 1); // odd numerator: a knot (common practice)
      }),
      { numRuns: 40 },
    );
  });

  it('twist knots: trefoil, figure-eight, 5_2, 6_1', () => {
    // Jones polynomials from memory, as in jones.test.ts; twist(2) is amphichiral.
    expect(jones(twistKnot(0)).equals(Laurent.one)).toBe(true);
    expect(determinantOf(jones(twistKnot(1)))).toBe(3n);
    expect(jones(twistKnot(2)).equals(V([[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]))).toBe(true);
    const v3 = jones(twistKnot(3));
    const knot52 = V([[1, 1], [2, -1], [3, 2], [4, -1], [5, 1], [6, -1]]);
    expect(v3.equals(knot52) || v3.equals(knot52.substitute(-1))).toBe(true);
    expect(determinantOf(jones(twistKnot(4)))).toBe(9n); // 6_1 has determinant 9 (from memory)
  });

  it('pretzel links: determinant |sum_i prod_(j != i) a_j| and P(-2,3,5) = T(3,5)', () => {
    // det P(a1..ak) = |sum_i prod_(j!=i) a_j| (from memory; e.g. Kauffman, "On Knots", 1987)
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -4, max: 4 }).filter((a) => a !== 0), { minLength: 2, maxLength: 4 }), (a) => {
        const det = a.reduce((s, _, i) => s + a.reduce((p, x, j) => (j === i ? p : p * x), 1), 0);
        expect(determinantOf(jones(pretzelLink(a)))).toBe(BigInt(Math.abs(det)));
      }),
      { numRuns: 30 },
    );
    // P(-2,3,5) is the torus knot T(3,5) (from memory), here the positive one.
    expect(jones(pretzelLink([-2, 3, 5])).equals(jonesTorusKnot(3, 5))).toBe(true);
  });

  it('mirror sends V(t) to V(1/t) and negates framings (property)', () => {
    fc.assert(
      fc.property(arbBraid(10, 4), (w) => {
        const d = fromBraid(w);
        expect(jones(mirror(d)).equals(jones(d).substitute(-1))).toBe(true);
      }),
      { numRuns: 50 },
    );
    // The framing follows its component, whose place in the component order may change.
    expect([...mirror(diagram(fromBraid([1, 1]).pd, { framings: [2, null] })).framings].sort()).toEqual([-2, null]);
  });

  it('connected sum multiplies and disjoint union multiplies by the unlink factor (property)', () => {
    // V(K1 # K2) = V(K1) V(K2), V(L1 u L2) = (-t^(1/2) - t^(-1/2)) V(L1) V(L2) (Lickorish, ch. 3)
    fc.assert(
      fc.property(arbBraid(6, 3), arbBraid(6, 3), (w1, w2) => {
        const [d1, d2] = [fromBraid(w1), fromBraid(w2)];
        expect(jones(disjointUnion(d1, d2)).equals(jones(d1).mul(jones(d2)).mul(loop))).toBe(true);
        expect(componentCount(disjointUnion(d1, d2))).toBe(componentCount(d1) + componentCount(d2));
        if (componentCount(d1) === 1 && componentCount(d2) === 1) {
          expect(jones(connectedSum(d1, d2)).equals(jones(d1).mul(jones(d2)))).toBe(true);
        }
      }),
      { numRuns: 40 },
    );
    expect(jones(connectedSum(unknot, fromBraid([1, 1, 1]))).equals(jones(fromBraid([1, 1, 1])))).toBe(true);
  });

  it('reversing a component multiplies V by t^(-3 lk) (property)', () => {
    // Lickorish, An Introduction to Knot Theory, Prop. 3.7: reversing component K of L gives
    // V(L') = t^(-3 lambda) V(L), lambda = lk(K, L - K).
    fc.assert(
      fc.property(arbBraid(10, 4), fc.nat(), (w, k) => {
        const d = fromBraid(w);
        const c = componentCount(d);
        const i = k % c;
        const lambda = linkingMatrix(d)[i].reduce((sum, lk, j) => (j === i ? sum : sum + lk), 0); // off the diagonal
        expect(jones(reverseComponent(d, i)).equals(jones(d).shift(-3 * lambda))).toBe(true);
      }),
      { numRuns: 50 },
    );
  });

  it('sublinks: any two rings of the Borromean rings are unlinked, a Hopf component is an unknot', () => {
    // Borromean rings: every two-component sublink is trivial (common practice)
    const borromean = fromBraid([1, -2, 1, -2, 1, -2]);
    for (const keep of [[0, 1], [0, 2], [1, 2]]) expect(jones(sublink(borromean, keep)).equals(loop)).toBe(true);
    const one = sublink(diagram(fromBraid([1, 1]).pd, { framings: [4, null] }), [0]);
    expect(one).toEqual({ pd: [], unknots: 1, framings: [4] });
    expect(jones(sublink(disjointUnion(fromBraid([1, 1, 1]), unknot), [1])).equals(Laurent.one)).toBe(true);
  });

  it('reverses a two-edge component that passes only over', () => {
    // R2 bigon of two circles: {1,2} passes under twice, {3,4} only over (see pd.test.ts).
    const d = diagram([[1, 4, 2, 3], [2, 4, 1, 3]]);
    expect(orient(d.pd).signs).toEqual([-1, 1]);
    expect(orient(reverseComponent(d, 1).pd).signs).toEqual([1, -1]); // both crossings change sign
    expect(orient(reverseComponent(reverseComponent(d, 1), 1).pd).signs).toEqual([-1, 1]);
  });

  it('cables: follow the framing, copies link as the framing says', () => {
    // (r,0)-cable of the f-framed unknot is T(r, r f) (common practice).
    for (const [r, f] of [[2, 1], [2, -3], [3, 2], [3, -1]]) {
      expect(jones(cable(diagram([], { unknots: 1, framings: [f] }), 0, r, 0)).equals(jones(torusLink(r, r * f)))).toBe(true);
    }
    const trefoil = fromBraid([1, 1, 1]);
    expect(jones(cable(trefoil, 0, 1, 0)).equals(jones(trefoil))).toBe(true);
    fc.assert(
      fc.property(arbBraid(5, 3), fc.integer({ min: -3, max: 3 }), fc.integer({ min: 0, max: 2 }), fc.integer({ min: 0, max: 1 }), (w, f, rp, rm) => {
        fc.pre(rp + rm >= 1);
        const d = fromBraid(w);
        // Other components framed 0, so the copies are the components with a null (blackboard) framing.
        const framed = diagram(d.pd, { unknots: d.unknots, framings: d.framings.map((_, i) => (i === 0 ? f : 0)) });
        const c = cable(framed, 0, rp, rm);
        expect(componentCount(c)).toBe(componentCount(d) + rp + rm - 1);
        // Each copy alone is the component alone (a pushoff is isotopic to it; common practice).
        const alone = jones(sublink(d, [0]));
        const copies = c.framings.flatMap((x, i) => (x === null ? [i] : []));
        for (const copy of copies) expect(jones(sublink(c, [copy])).equals(alone)).toBe(true);
        // With r = 1 the cable is the component itself, reversed for (0, 1).
        if (rp + rm === 1) {
          const expected = rm === 1 ? reverseComponent(d, 0) : d;
          expect(jones(c).equals(jones(expected))).toBe(true);
        }
        // Two copies link f times, times -1 when one is reversed (framing = pushoff linking).
        if (rp + rm === 2) {
          expect(linkingMatrix(c)[copies[0]][copies[1]]).toBe((rm === 1 ? -f : f) + 0); // + 0 folds -0
        }
      }),
      { numRuns: 40 },
    );
  });
});
