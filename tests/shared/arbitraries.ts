// fast-check generators of diagrams shared by the knot tests.
import fc from 'fast-check';
import { fromBraid } from '@/shared/knot/braid';
import { Diagram } from '@/shared/knot/diagram';
import { pretzelLink, rationalLink } from '@/shared/knot/families';
import { randomMoves, seededRng } from '@/shared/knot/moves';

/** Braid words of 1..maxLength letters on 2..maxStrands strands. */
export const arbBraid = (maxLength = 12, maxStrands = 5) =>
  fc
    .integer({ min: 2, max: maxStrands })
    .chain((n) => fc.array(fc.integer({ min: 1, max: n - 1 }).chain((k) => fc.constantFrom(k, -k)), { minLength: 1, maxLength }));

const twists = fc.integer({ min: -3, max: 3 }).filter((a) => a !== 0);

/** Diagrams of at most maxCrossings crossings: braid closures, pretzels, rational links, then random Reidemeister moves. */
export const arbDiagram = (maxCrossings = 12): fc.Arbitrary<Diagram> =>
  fc
    .tuple(
      fc.oneof(
        arbBraid(8, 4).map((w) => fromBraid(w)),
        fc.array(twists, { minLength: 2, maxLength: 3 }).map((a) => pretzelLink(a)),
        fc.array(twists, { minLength: 1, maxLength: 3 }).map((a) => rationalLink(a)),
      ),
      fc.integer({ min: 0, max: 6 }),
      fc.integer(),
    )
    .map(([d, moves, seed]) => randomMoves(d, moves, seed))
    .filter((d) => d.pd.length <= maxCrossings);

/** A seeded braid word using every generator in turn with random signs: its closure's cut is about twice the strands. */
export const wideWord = (strands: number, crossings: number, seed: number): number[] => {
  const rng = seededRng(seed);
  return Array.from({ length: crossings }, (_, i) => ((i % (strands - 1)) + 1) * (rng() < 0.5 ? 1 : -1));
};
