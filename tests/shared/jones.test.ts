import { fromBraid } from '@/shared/knot/braid';
import { bracket } from '@/shared/knot/bracket';
import { diagram, unknot } from '@/shared/knot/diagram';
import { jones } from '@/shared/knot/jones';
import { stateSumBracket } from '@/shared/knot/statesum';
import { Laurent } from '@/shared/poly/laurent';

const V = (pairs: [number, number][]) => Laurent.fromPairs(pairs);
const J = (word: number[]) => jones(fromBraid(word));

describe('Jones polynomial: published values', () => {
  it('unknot and unlinks', () => {
    expect(jones(unknot).equals(Laurent.one)).toBe(true);
    // Two-component unlink: -t^(1/2) - t^(-1/2) (Jones 1985, the value of the split union)
    expect(jones(diagram([], { unknots: 2 })).equals(V([[-0.5, -1], [0.5, -1]]))).toBe(true);
  });

  it('trefoils', () => {
    // Right-handed trefoil t + t^3 - t^4 (DESIGN.md; Lickorish, An Introduction to Knot Theory, ch. 3)
    expect(J([1, 1, 1]).equals(V([[1, 1], [3, 1], [4, -1]]))).toBe(true);
    // Left-handed trefoil: its mirror, t^-1 + t^-3 - t^-4 (same source)
    expect(J([-1, -1, -1]).equals(V([[-1, 1], [-3, 1], [-4, -1]]))).toBe(true);
  });

  it('figure-eight knot: t^-2 - t^-1 + 1 - t + t^2 (Lickorish, ch. 3)', () => {
    expect(J([1, -2, 1, -2]).equals(V([[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]))).toBe(true);
  });

  it('Hopf link in both orientations', () => {
    // Positive Hopf link (linking number +1): -t^(1/2) - t^(5/2); negative: -t^(-1/2) - t^(-5/2)
    // (Jones 1985, "A polynomial invariant for knots via von Neumann algebras"; from memory)
    expect(J([1, 1]).equals(V([[0.5, -1], [2.5, -1]]))).toBe(true);
    expect(J([-1, -1]).equals(V([[-0.5, -1], [-2.5, -1]]))).toBe(true);
  });

  it('5_1 and 5_2', () => {
    // 5_1 as the closure of sigma_1^5: t^2 + t^4 - t^5 + t^6 - t^7 (torus knot T(2,5); from memory)
    expect(J([1, 1, 1, 1, 1]).equals(V([[2, 1], [4, 1], [5, -1], [6, 1], [7, -1]]))).toBe(true);
    // 5_2 as the closure of sigma_1^3 sigma_2 sigma_1^-1 sigma_2: t - t^2 + 2t^3 - t^4 + t^5 - t^6
    // (from memory; this chirality, the one with positive writhe)
    expect(J([1, 1, 1, 2, -1, 2]).equals(V([[1, 1], [2, -1], [3, 2], [4, -1], [5, 1], [6, -1]]))).toBe(true);
  });

  it('Whitehead link and Borromean rings', () => {
    // Whitehead link, closure of sigma_1^2 sigma_2^-1 sigma_1 sigma_2^-1:
    // V = t^(-3/2) (-1 + t - 2t^2 + t^3 - 2t^4 + t^5) (from memory), and its mirror for the mirror word
    const expected = V([[0, -1], [1, 1], [2, -2], [3, 1], [4, -2], [5, 1]]).shift(-1.5);
    expect(J([1, 1, -2, 1, -2]).equals(expected)).toBe(true);
    expect(J([-1, -1, 2, -1, 2]).equals(expected.substitute(-1))).toBe(true);
    // Borromean rings (sigma_1 sigma_2^-1)^3: -t^3 + 3t^2 - 2t + 4 - 2t^-1 + 3t^-2 - t^-3 (from memory)
    expect(J([1, -2, 1, -2, 1, -2]).equals(V([[3, -1], [2, 3], [1, -2], [0, 4], [-1, -2], [-2, 3], [-3, -1]]))).toBe(true);
  });

  it('tangle contraction equals the state sum on these examples', () => {
    for (const word of [[1, 1, 1], [1, -2, 1, -2], [1, 1, -2, 1, -2], [1, 2, 3, -1, 2, -3, 1, 1]]) {
      const d = fromBraid(word);
      expect(bracket(d).equals(stateSumBracket(d))).toBe(true);
    }
  });
});
