// fast-check generators of diagrams shared by the knot tests.
import fc from 'fast-check';

/** Braid words of 1..maxLength letters on 2..maxStrands strands. */
export const arbBraid = (maxLength = 12, maxStrands = 5) =>
  fc
    .integer({ min: 2, max: maxStrands })
    .chain((n) => fc.array(fc.integer({ min: 1, max: n - 1 }).chain((k) => fc.constantFrom(k, -k)), { minLength: 1, maxLength }));
