// Jones polynomials of small knots and links against published values, and the published values
// themselves against identities they must satisfy (so a mistake in memory shows up as well).
import fc from 'fast-check';
import { fromBraid } from '@/shared/knot/braid';
import { bracket } from '@/shared/knot/bracket';
import { diagram, unknot } from '@/shared/knot/diagram';
import { jones } from '@/shared/knot/jones';
import { stateSumBracket } from '@/shared/knot/statesum';
import { Laurent } from '@/shared/poly/laurent';
import { arbDiagram } from './arbitraries';
import { atOmega, determinantOf } from './roots';

const V = (pairs: [number, number][]) => Laurent.fromPairs(pairs);
const J = (word: number[]) => jones(fromBraid(word));

// Right-handed trefoil t + t^3 - t^4 (docs/conventions.md; Lickorish, An Introduction to Knot Theory, ch. 3).
const trefoil = V([[1, 1], [3, 1], [4, -1]]);
// Figure-eight t^-2 - t^-1 + 1 - t + t^2 (Lickorish, ch. 3).
const figureEight = V([[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]);
// Positive Hopf link (linking number +1): -t^(1/2) - t^(5/2) (Jones 1985, "A polynomial invariant
// for knots via von Neumann algebras"; from memory).
const hopf = V([[0.5, -1], [2.5, -1]]);
// 5_1 = T(2,5) as the closure of sigma_1^5: t^2 + t^4 - t^5 + t^6 - t^7 (from memory).
const cinquefoil = V([[2, 1], [4, 1], [5, -1], [6, 1], [7, -1]]);
// 5_2 as the closure of sigma_1^3 sigma_2 sigma_1^-1 sigma_2, the chirality with positive writhe:
// t - t^2 + 2t^3 - t^4 + t^5 - t^6 (from memory).
const threeTwist = V([[1, 1], [2, -1], [3, 2], [4, -1], [5, 1], [6, -1]]);
// Whitehead link, closure of sigma_1^2 sigma_2^-1 sigma_1 sigma_2^-1:
// t^(-3/2) (-1 + t - 2t^2 + t^3 - 2t^4 + t^5) (from memory).
const whitehead = V([[0, -1], [1, 1], [2, -2], [3, 1], [4, -2], [5, 1]]).shift(-1.5);
// Borromean rings (sigma_1 sigma_2^-1)^3: -t^3 + 3t^2 - 2t + 4 - 2t^-1 + 3t^-2 - t^-3 (from memory).
const borromean = V([[3, -1], [2, 3], [1, -2], [0, 4], [-1, -2], [-2, 3], [-3, -1]]);

describe('Jones polynomial: published values', () => {
  it('unknot and unlinks', () => {
    expect(jones(unknot).equals(Laurent.one)).toBe(true);
    // Two-component unlink: -t^(1/2) - t^(-1/2) (Jones 1985, the value of the split union)
    expect(jones(diagram([], { unknots: 2 })).equals(V([[-0.5, -1], [0.5, -1]]))).toBe(true);
  });

  it('trefoils', () => {
    expect(J([1, 1, 1]).equals(trefoil)).toBe(true);
    // Left-handed trefoil: its mirror, t^-1 + t^-3 - t^-4 (same source)
    expect(J([-1, -1, -1]).equals(trefoil.substitute(-1))).toBe(true);
  });

  it('figure-eight knot', () => {
    expect(J([1, -2, 1, -2]).equals(figureEight)).toBe(true);
  });

  it('Hopf link in both orientations', () => {
    expect(J([1, 1]).equals(hopf)).toBe(true);
    expect(J([-1, -1]).equals(hopf.substitute(-1))).toBe(true); // negative: -t^(-1/2) - t^(-5/2)
  });

  it('5_1 and 5_2', () => {
    expect(J([1, 1, 1, 1, 1]).equals(cinquefoil)).toBe(true);
    expect(J([1, 1, 1, 2, -1, 2]).equals(threeTwist)).toBe(true);
  });

  it('Whitehead link and Borromean rings', () => {
    expect(J([1, 1, -2, 1, -2]).equals(whitehead)).toBe(true);
    expect(J([-1, -1, 2, -1, 2]).equals(whitehead.substitute(-1))).toBe(true); // the mirror word
    expect(J([1, -2, 1, -2, 1, -2]).equals(borromean)).toBe(true);
  });

  it('the values above satisfy V(1) = (-2)^(c-1), V(e^(2 pi i/3)) = 1 for knots and |V(-1)| = det', () => {
    // Jones 1985 (Bull. AMS 12) for V(1) and V(omega); determinants from Rolfsen, Appendix C
    // (knots) and from memory (links): checks of the remembered polynomials, not of the code.
    const listed: [Laurent, number, bigint][] = [
      [trefoil, 1, 3n],
      [figureEight, 1, 5n],
      [cinquefoil, 1, 5n],
      [threeTwist, 1, 7n],
      [hopf, 2, 2n],
      [whitehead, 2, 8n],
      [borromean, 3, 16n],
    ];
    for (const [v, components, det] of listed) {
      expect(v.substitute(2).evaluate(1)).toEqual({ num: (-2n) ** BigInt(components - 1), den: 1n }); // t^(1/2) -> s
      if (components === 1) expect(atOmega(v)).toEqual([1n, 0n]);
      expect(determinantOf(v)).toBe(det);
    }
  });

  it('tangle contraction equals the state sum on these examples', () => {
    for (const word of [[1, 1, 1], [1, -2, 1, -2], [1, 1, -2, 1, -2], [1, 2, 3, -1, 2, -3, 1, 1]]) {
      const d = fromBraid(word);
      expect(bracket(d).equals(stateSumBracket(d))).toBe(true);
    }
  });
});

describe('bracket by contraction', () => {
  it('equals the state sum on random diagrams (order chosen between greedy and tree decomposition)', () => {
    fc.assert(
      fc.property(arbDiagram(14), (d) => {
        expect(bracket(d).equals(stateSumBracket(d))).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
});
