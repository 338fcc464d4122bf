// HOMFLY-PT polynomial (convention of docs/conventions.md): published values of small knots and
// links, the Jones and Conway specialisations on random diagrams, and invariance under random
// Reidemeister and Markov moves.
import fc from 'fast-check';
import { alexander } from '@/shared/knot/alexander';
import { fromBraid } from '@/shared/knot/braid';
import { componentCount, Diagram, diagram, unknot } from '@/shared/knot/diagram';
import { disjointUnion, mirror, reverseComponent } from '@/shared/knot/families';
import { homfly } from '@/shared/knot/homfly';
import { jones } from '@/shared/knot/jones';
import { Braid, randomMarkovMove, randomMoves, seededRng } from '@/shared/knot/moves';
import { Poly2 } from '@/shared/knot/poly2';
import { Laurent } from '@/shared/poly/laurent';
import { arbBraid, arbDiagram } from './arbitraries';
import { scramble } from './scramble';

const P = (triples: [number, number, number][]) => Poly2.fromTriples(triples);
const H = (word: number[]) => homfly(fromBraid(word));
/** (v^-1 - v) z^-1: the two-component unlink (the skein relation at a kink). */
const delta = P([[-1, -1, 1], [1, -1, -1]]);

// Values from memory, each checked below against its Jones polynomial (tests/shared/jones.test.ts)
// and its Conway polynomial, so a slip of memory shows up too.
// Positive trefoil, closure of sigma_1^3 (3_1 in docs/conventions.md): 2v^2 - v^4 + v^2 z^2.
const trefoil = P([[2, 0, 2], [4, 0, -1], [2, 2, 1]]);
// Figure-eight: v^-2 - 1 + v^2 - z^2.
const figureEight = P([[-2, 0, 1], [0, 0, -1], [2, 0, 1], [0, 2, -1]]);
// Positive Hopf link, closure of sigma_1^2: (v - v^3) z^-1 + v z.
const hopf = P([[1, -1, 1], [3, -1, -1], [1, 1, 1]]);
// 5_1 = T(2,5), closure of sigma_1^5: 3v^4 - 2v^6 + (4v^4 - v^6) z^2 + v^4 z^4.
const cinquefoil = P([[4, 0, 3], [6, 0, -2], [4, 2, 4], [6, 2, -1], [4, 4, 1]]);
// 5_2, closure of sigma_1^3 sigma_2 sigma_1^-1 sigma_2 (positive writhe): v^2 + v^4 - v^6 + (v^2 + v^4) z^2.
const threeTwist = P([[2, 0, 1], [4, 0, 1], [6, 0, -1], [2, 2, 1], [4, 2, 1]]);

/** t^(1/2) - t^(-1/2), the z of both specialisations. */
const Z = Laurent.fromPairs([[0.5, 1], [-0.5, -1]]);

/** sum c t^(a vExp) Z^(zExp + lift): P at v = t^a, z = Z, times Z^lift (lift clears the negative powers of z). */
function specialise(p: Poly2, a: number, lift: number): Laurent {
  return p.toTriples().reduce((sum, [v, z, c]) => sum.add(Z.pow(z + lift).shift(a * v).scale(c)), Laurent.zero);
}

/** P(v = 1, z) as coefficients by power of z; the negative powers must cancel. */
function conway(p: Poly2): Map<number, bigint> {
  const byZ = new Map<number, bigint>();
  for (const [, z, c] of p.toTriples()) byZ.set(z, (byZ.get(z) ?? 0n) + c);
  for (const [z, c] of byZ) if (c === 0n) byZ.delete(z);
  return byZ;
}
const conwayToAlexander = (c: Map<number, bigint>): Laurent => [...c].reduce((sum, [z, k]) => sum.add(Z.pow(z).scale(k)), Laurent.zero);

/**
 * V(t) = P(v = t, z = t^(1/2) - t^(-1/2)): with our Jones convention (V = (-A^3)^-w <D> at
 * A = t^(-1/4), positive trefoil t + t^3 - t^4) the skein relation of V is
 * t^-1 V(L+) - t V(L-) = (t^(1/2) - t^(-1/2)) V(L0) (Jones 1985; Lickorish, ch. 3), which is ours
 * at v = t, not t^-1. Both sides are multiplied by z^(c-1), since P has powers down to z^(1-c).
 */
function jonesMatches(d: Diagram, p = homfly(d)): boolean {
  const lift = componentCount(d) - 1;
  return specialise(p, 1, lift).equals(jones(d).mul(Z.pow(lift)));
}

describe('HOMFLY-PT polynomial: published values', () => {
  it('the remembered values have the Jones polynomials of tests/shared/jones.test.ts', () => {
    // Same values as there (Lickorish, ch. 3, and from memory).
    const jonesOf: [Poly2, number, [number, number][]][] = [
      [trefoil, 1, [[1, 1], [3, 1], [4, -1]]],
      [figureEight, 1, [[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]],
      [hopf, 2, [[0.5, -1], [2.5, -1]]],
      [cinquefoil, 1, [[2, 1], [4, 1], [5, -1], [6, 1], [7, -1]]],
      [threeTwist, 1, [[1, 1], [2, -1], [3, 2], [4, -1], [5, 1], [6, -1]]],
    ];
    for (const [p, components, v] of jonesOf) {
      expect(specialise(p, 1, components - 1).equals(Laurent.fromPairs(v).mul(Z.pow(components - 1)))).toBe(true);
    }
  });

  it('the remembered values have the Conway polynomials of Lickorish, ch. 8 (1 + z^2, 1 - z^2, z, 1 + 3z^2 + z^4, 1 + 2z^2)', () => {
    expect([...conway(trefoil)]).toEqual([[0, 1n], [2, 1n]]);
    expect([...conway(figureEight)]).toEqual([[0, 1n], [2, -1n]]);
    expect([...conway(hopf)]).toEqual([[1, 1n]]);
    expect([...conway(cinquefoil)]).toEqual([[0, 1n], [2, 3n], [4, 1n]]);
    expect([...conway(threeTwist)]).toEqual([[0, 1n], [2, 2n]]);
  });

  it('unknot, unlinks and the empty diagram', () => {
    expect(homfly(unknot).equals(Poly2.one)).toBe(true);
    // A split union with the unknot multiplies by delta (the skein relation at a kink).
    expect(homfly(diagram([], { unknots: 3 })).equals(delta.pow(2))).toBe(true);
    // A diagram of no components at all: 1 by our convention (shared/knot/homfly.ts).
    expect(homfly(diagram([], { unknots: 0 })).equals(Poly2.one)).toBe(true);
  });

  it('trefoils, figure-eight, Hopf links, 5_1 and 5_2 with the chirality of docs/conventions.md', () => {
    expect(H([1, 1, 1]).equals(trefoil)).toBe(true);
    // The mirror image: v -> v^-1, z -> -z (Lickorish, ch. 15), so 2v^-2 - v^-4 + v^-2 z^2.
    expect(H([-1, -1, -1]).equals(P([[-2, 0, 2], [-4, 0, -1], [-2, 2, 1]]))).toBe(true);
    expect(H([1, -2, 1, -2]).equals(figureEight)).toBe(true);
    expect(H([1, 1]).equals(hopf)).toBe(true);
    // Negative Hopf link, the mirror: (v^-3 - v^-1) z^-1 - v^-1 z.
    expect(H([-1, -1]).equals(P([[-3, -1, 1], [-1, -1, -1], [-1, 1, -1]]))).toBe(true);
    expect(H([1, 1, 1, 1, 1]).equals(cinquefoil)).toBe(true);
    expect(H([1, 1, 1, 2, -1, 2]).equals(threeTwist)).toBe(true);
  });
});

describe('HOMFLY-PT polynomial: theorems on random diagrams', () => {
  it('P(v = t, z = t^(1/2) - t^(-1/2)) is the Jones polynomial', () => {
    fc.assert(fc.property(arbDiagram(12), (d) => jonesMatches(d)), { numRuns: 60 });
  });

  it('P(v = 1, z) is the Conway polynomial: Delta(t) at z = t^(1/2) - t^(-1/2) (Conway 1970; Lickorish, ch. 8)', () => {
    fc.assert(
      fc.property(arbDiagram(12), (d) => {
        const c = conway(homfly(d));
        const a = alexander(d);
        expect([...c.keys()].every((z) => z >= 0)).toBe(true);
        const ours = conwayToAlexander(c);
        // Where the first Conway coefficient vanishes our Alexander sign is a convention only.
        expect(a.conwaySign ? ours.equals(a.polynomial) : ours.equals(a.polynomial) || ours.equals(a.polynomial.negate())).toBe(true);
      }),
      { numRuns: 60 },
    );
  });

  it('a split union multiplies: P(L1 u L2) = delta P(L1) P(L2) (Lickorish, ch. 15)', () => {
    fc.assert(
      fc.property(arbDiagram(7), arbDiagram(7), (d1, d2) => homfly(disjointUnion(d1, d2)).equals(delta.mul(homfly(d1)).mul(homfly(d2)))),
      { numRuns: 20 },
    );
  });

  it('the mirror image has P(v^-1, -z) (Lickorish, ch. 15)', () => {
    const flip = (p: Poly2) => Poly2.fromTriples(p.toTriples().map(([v, z, c]) => [-v, z, z % 2 === 0 ? c : -c]));
    fc.assert(fc.property(arbDiagram(10), (d) => homfly(mirror(d)).equals(flip(homfly(d)))), { numRuns: 30 });
  });

  it('reversing every component changes nothing (Lickorish, ch. 15); with one component reversed it still specialises to Jones', () => {
    fc.assert(
      fc.property(arbDiagram(10), fc.nat(), (d, k) => {
        const n = componentCount(d);
        let all = d;
        for (let c = 0; c < n; c++) all = reverseComponent(all, c);
        expect(homfly(all).equals(homfly(d))).toBe(true);
        expect(jonesMatches(reverseComponent(d, k % n))).toBe(true);
      }),
      { numRuns: 30 },
    );
  });

  it('is unchanged by random Reidemeister moves and by relabelling', () => {
    fc.assert(
      fc.property(arbDiagram(9), fc.integer({ min: 1, max: 12 }), fc.integer(), (d, moves, seed) => {
        const p = homfly(d);
        expect(homfly(randomMoves(d, moves, seed)).equals(p)).toBe(true);
        const { pd } = scramble(d.pd, seededRng(seed));
        expect(homfly(diagram(pd, { unknots: d.unknots })).equals(p)).toBe(true);
      }),
      { numRuns: 40 },
    );
  });

  it('is unchanged by random Markov moves of a braid (Markov theorem; Birman 1974)', () => {
    fc.assert(
      fc.property(arbBraid(10, 4), fc.integer(), (word, seed) => {
        const rng = seededRng(seed);
        let b: Braid = { word, strands: Math.max(...word.map(Math.abs)) + 1 };
        const p = homfly(fromBraid(b.word, b.strands));
        for (let m = 0; m < 6; m++) b = randomMarkovMove(b, rng);
        expect(homfly(fromBraid(b.word, b.strands)).equals(p)).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
});
