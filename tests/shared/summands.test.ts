// Connected summands along 2-edge cuts: found exactly when a brute-force search over pairs of
// edges finds a cut; the summands' state-sum brackets multiply to the whole code's; and
// bracketOfPD, which multiplies the summands' brackets for wide codes, equals the contraction
// alone on connected sums of closed braids, also after random Reidemeister moves.
import fc from 'fast-check';
import { fromBraid } from '@/shared/knot/braid';
import { bracketByContraction, bracketOfPD } from '@/shared/knot/bracket';
import { diagram } from '@/shared/knot/diagram';
import { connectedSum, disjointUnion, torusLink } from '@/shared/knot/families';
import { jones } from '@/shared/knot/jones';
import { randomMoves } from '@/shared/knot/moves';
import { PDCode } from '@/shared/knot/pd';
import { stateSumBracket } from '@/shared/knot/statesum';
import { connectedSummands } from '@/shared/knot/summands';
import { Laurent } from '@/shared/poly/laurent';
import { arbDiagram, wideWord } from './arbitraries';

/** Crossings reached from crossing 0 without the edges left out. */
const reached = (pd: PDCode, without: ReadonlySet<number>): number => {
  const seen = new Set([0]);
  const stack = [0];
  while (stack.length > 0) {
    const i = stack.pop()!;
    pd.forEach((x, j) => {
      if (!seen.has(j) && pd[i].some((l) => !without.has(l) && x.includes(l))) {
        seen.add(j);
        stack.push(j);
      }
    });
  }
  return seen.size;
};

/** The reference: some pair of edges whose removal disconnects the crossings. */
const hasTwoCut = (pd: PDCode): boolean => {
  const labels = [...new Set(pd.flat())];
  return labels.some((a, i) => labels.slice(i + 1).some((b) => reached(pd, new Set([a, b])) < pd.length));
};

const everyLabelTwice = (pd: PDCode): boolean => {
  const count = new Map<number, number>();
  pd.flat().forEach((l) => count.set(l, (count.get(l) ?? 0) + 1));
  return [...count.values()].every((c) => c === 2);
};

const arbSum = fc.tuple(arbDiagram(7), arbDiagram(7), fc.integer({ min: 0, max: 4 }), fc.integer()).map(([d1, d2, moves, seed]) => {
  const sum = d1.pd.length > 0 && d2.pd.length > 0 ? connectedSum(d1, d2) : d1;
  return randomMoves(sum, moves, seed);
});

describe('connected summands along 2-edge cuts', () => {
  it('are found exactly when a search over all pairs of edges finds a cut (property)', () => {
    let found = 0;
    fc.assert(
      fc.property(fc.oneof(arbSum, arbDiagram(12)), (d) => {
        fc.pre(d.pd.length > 0 && reached(d.pd, new Set()) === d.pd.length);
        const parts = connectedSummands(d.pd);
        expect(parts !== undefined).toBe(hasTwoCut(d.pd));
        if (parts) found++;
      }),
      { numRuns: 150 },
    );
    expect(found).toBeGreaterThan(10); // the splitting path was exercised, not only refusals
  }, 60_000);

  it("split a code into pieces whose state-sum brackets multiply to the code's (property)", () => {
    // The bracket of a connected sum is the product of the summands' (normalised <O> = 1;
    // Kauffman, "State models and the Jones polynomial", Topology 26, 1987: common practice).
    fc.assert(
      fc.property(arbSum, (d) => {
        const parts = connectedSummands(d.pd);
        fc.pre(parts !== undefined);
        expect(parts!.length).toBeGreaterThanOrEqual(2);
        expect(parts!.reduce((n, p) => n + p.length, 0)).toBe(d.pd.length);
        for (const p of parts!) expect(everyLabelTwice(p)).toBe(true);
        const product = parts!.reduce((b, p) => b.mul(stateSumBracket(diagram(p))), Laurent.one);
        expect(product.equals(stateSumBracket(diagram(d.pd)))).toBe(true);
      }),
      { numRuns: 100 },
    );
  }, 60_000);

  it('are refused for a torus knot and for a split link', () => {
    // T(3,4) as the closure of (sigma_1 sigma_2)^4 has no 2-edge cut (checked by the search
    // above); a split link's crossings are not connected.
    const t = torusLink(3, 4);
    expect(hasTwoCut(t.pd)).toBe(false);
    expect(connectedSummands(t.pd)).toBeUndefined();
    expect(connectedSummands(disjointUnion(t, torusLink(2, 3)).pd)).toBeUndefined();
  });
});

describe('bracketOfPD on wide connected sums', () => {
  it('equals the contraction alone on sums of 6- to 8-strand closed braids, also after random moves (property)', () => {
    // Reidemeister moves keep the Jones polynomial (Kauffman 1987), so the moved sum's agrees too.
    let split = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: 6, max: 8 }),
        fc.integer({ min: 6, max: 8 }),
        fc.integer({ min: 20, max: 36 }),
        fc.integer({ min: 0, max: 8 }),
        fc.integer(),
        (s1, s2, crossings, moves, seed) => {
          const sum = connectedSum(fromBraid(wideWord(s1, crossings, seed), s1), fromBraid(wideWord(s2, crossings + 1, seed + 1), s2));
          const moved = randomMoves(sum, moves, seed);
          if (connectedSummands(moved.pd)) split++;
          expect(bracketOfPD(moved.pd, moved.unknots).equals(bracketByContraction(moved.pd, moved.unknots))).toBe(true);
          expect(jones(moved).equals(jones(sum))).toBe(true);
        },
      ),
      { numRuns: 12 },
    );
    expect(split).toBeGreaterThan(0);
  }, 120_000);
});
