// The bracket's contraction at sizes the state sum cannot reach: exact limbs of doubles against
// plain doubles, any crossing order against the chosen one, and invariance under random
// Reidemeister moves and mirroring on diagrams of 40 to 60 crossings. (The state-sum
// comparisons on small random diagrams are in jones.test.ts and moves.test.ts.)
import fc from 'fast-check';
import { fromBraid } from '@/shared/knot/braid';
import { bracketByContraction, bracketOfPD } from '@/shared/knot/bracket';
import { stateGraph } from '@/shared/knot/bracket-states';
import { closedSum } from '@/shared/knot/bracket-sum';
import { contractionOrder } from '@/shared/knot/contraction-order';
import { mirror } from '@/shared/knot/families';
import { jones } from '@/shared/knot/jones';
import { randomMoves, seededRng } from '@/shared/knot/moves';
import { PDCode } from '@/shared/knot/pd';
import { stateSumBracket } from '@/shared/knot/statesum';
import { arbBraid, wideWord } from './arbitraries';

// Its closure's cut is about twice the strands, beyond the greedy order's comfortable range.
const wideBraid = (strands: number, crossings: number, seed: number) => fromBraid(wideWord(strands, crossings, seed), strands);

describe('exact sums in limbs of doubles', () => {
  it('give the sums of plain doubles when doubles are trusted only to 2^12 in limbs of 2 bits (property)', () => {
    let carried = 0;
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 6 }), fc.integer({ min: 20, max: 50 }), fc.integer(), (strands, crossings, seed) => {
        const d = wideBraid(strands, crossings, seed);
        const graph = stateGraph(d.pd, contractionOrder(d.pd).order);
        const small = closedSum(graph, { exactBits: 12, limbBits: 2 });
        const plain = closedSum(graph);
        expect(plain.limbs).toBe(1); // these sums stay far below 2^52
        expect({ off: small.off, c: small.c }).toEqual({ off: plain.off, c: plain.c });
        if (small.limbs > 1) carried++;
      }),
      { numRuns: 30 },
    );
    expect(carried).toBeGreaterThan(0); // the carries were exercised, not only the one-limb path
  }, 60_000);

  it('grow as many limbs as one step needs when its terms weigh more than a limb holds', () => {
    // A case the property above met: with 2-bit limbs one new limb per step was not enough.
    const d = wideBraid(5, 33, -2147483646);
    const graph = stateGraph(d.pd, contractionOrder(d.pd).order);
    const small = closedSum(graph, { exactBits: 12, limbBits: 2 });
    const plain = closedSum(graph);
    expect({ off: small.off, c: small.c }).toEqual({ off: plain.off, c: plain.c });
  });

  it('carry a 200-crossing closure through several limbs to the same bracket as 32-bit limbs', () => {
    const d = wideBraid(6, 200, 7);
    const graph = stateGraph(d.pd, contractionOrder(d.pd).order);
    const narrow = closedSum(graph, { exactBits: 40, limbBits: 12 });
    const plain = closedSum(graph);
    expect(narrow.limbs).toBeGreaterThan(plain.limbs);
    expect({ off: narrow.off, c: narrow.c }).toEqual({ off: plain.off, c: plain.c });
  }, 60_000);
});

describe('bracket by tree decomposition', () => {
  it('does not depend on the order the crossings are contracted in (property)', () => {
    fc.assert(
      fc.property(arbBraid(10, 4), fc.integer(), (w, seed) => {
        const d = fromBraid(w);
        const rng = seededRng(seed);
        const order = d.pd.map((_, i) => i);
        for (let k = order.length - 1; k > 0; k--) {
          const j = Math.floor(rng() * (k + 1));
          [order[k], order[j]] = [order[j], order[k]];
        }
        expect(closedSum(stateGraph(d.pd, order))).toEqual(closedSum(stateGraph(d.pd, contractionOrder(d.pd).order)));
      }),
      { numRuns: 40 },
    );
  });

  it('gives the Jones polynomial of 40-crossing 8-strand closures unchanged by random Reidemeister moves (property)', () => {
    // The Jones polynomial is a link invariant (Jones 1985; Kauffman, "State models and the
    // Jones polynomial", Topology 26, 1987).
    fc.assert(
      fc.property(fc.integer(), fc.integer({ min: 1, max: 12 }), (seed, moves) => {
        const d = wideBraid(8, 40, seed);
        expect(jones(randomMoves(d, moves, seed)).equals(jones(d))).toBe(true);
      }),
      { numRuns: 6 },
    );
  }, 120_000);

  it('turns A into A^-1 under mirroring, on a 60-crossing 10-strand closure', () => {
    // <mirror D>(A) = <D>(A^-1) (Kauffman, "State models and the Jones polynomial", 1987).
    const d = wideBraid(10, 60, 3);
    expect(bracketByContraction(mirror(d).pd).equals(bracketByContraction(d.pd).substitute(-1))).toBe(true);
  }, 60_000);

  it('equals the state sum on a non-planar code, where states need not agree mod 4', () => {
    // One crossing whose opposite ends are joined: both smoothings leave one loop, so the two
    // states differ by A^2 (no planar code does this: a switch there changes the loops).
    const pd: PDCode = [[1, 2, 1, 2]];
    expect(stateGraph(pd, [0]).stride).toBe(2);
    expect(bracketOfPD(pd).equals(stateSumBracket({ pd, unknots: 0, framings: [] }))).toBe(true);
  });
});
