// Invariance of the classical invariants under random Reidemeister moves (Reidemeister 1927)
// and Markov moves (Markov 1935; Birman, Braids, Links and Mapping Class Groups, ch. 2): a
// theorem for each invariant, tested on diagrams no table lists.
import fc from 'fast-check';
import { Diagram, fromBraid } from '@/shared/knot';
import { alexander } from '@/shared/knot/alexander';
import { colourings } from '@/shared/knot/colourings';
import { linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { Braid, randomMarkovMove, randomMoves, seededRng } from '@/shared/knot/moves';
import { guessName } from '@/shared/knot/names';
import { arbBraid, arbDiagram } from './arbitraries';
import { pairwiseLinking } from './linking-numbers';

// Everything that must not change; linking numbers as a sorted list, since moves may renumber
// components, and without the diagonal (the blackboard framing changes under R1).
function invariants(d: Diagram) {
  const a = alexander(d);
  return {
    alexander: a.polynomial.toJSON(),
    conwaySign: a.conwaySign,
    determinant: linkDeterminant(d),
    signature: linkSignature(d),
    colourings3: colourings(d, 3),
    colourings5: colourings(d, 5),
    linking: pairwiseLinking(d),
    name: guessName(d)?.text,
  };
}

describe('classical invariants under moves', () => {
  it('do not change under random Reidemeister moves', () => {
    fc.assert(
      fc.property(arbDiagram(10), fc.integer({ min: 1, max: 8 }), fc.integer(), (d, count, seed) => {
        expect(invariants(randomMoves(d, count, seed))).toEqual(invariants(d));
      }),
      { numRuns: 120 },
    );
  });

  it('do not change under random Markov moves and braid relations', () => {
    fc.assert(
      fc.property(arbBraid(8, 4), fc.integer(), (word, seed) => {
        const rng = seededRng(seed);
        let b: Braid = { word, strands: Math.max(...word.map(Math.abs)) + 1 };
        const before = invariants(fromBraid(b.word, b.strands));
        for (let k = 0; k < 5; k++) b = randomMarkovMove(b, rng);
        expect(invariants(fromBraid(b.word, b.strands))).toEqual(before);
      }),
      { numRuns: 120 },
    );
  });
});
