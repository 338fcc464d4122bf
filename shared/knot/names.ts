// Name that knot: the prime knots up to 8 crossings (numbering of Rolfsen, Knots and Links,
// Appendix C), each given by a code and matched by its Jones polynomial, Alexander polynomial,
// determinant and signature. Every listed value is from memory (the tests recompute them from
// the codes: if memory and code disagree, the test fails). A match is a guess: these
// invariants do not determine a knot in general (e.g. 5_1 and 10_132 share Jones).
// Chirality: the table's representative is the diagram of its code; "(mirror)" means the
// mirror image of that diagram. Amphichiral knots (their Jones is symmetric) never say mirror.
import { Laurent } from '@/shared/poly/laurent';
import { alexander } from './alexander';
import { Diagram } from './diagram';
import { fromDT } from './dt';
import { rationalLink } from './families';
import { linkDeterminant, linkSignature } from './goeritz';
import { jones } from './jones';
import { orient } from './pd';

export interface KnotEntry {
  readonly name: string;
  /** A continued fraction [a1, ...] for a 2-bridge knot (Conway notation), else a DT code. */
  readonly rational?: readonly number[];
  readonly dt?: readonly number[];
  readonly determinant: number;
  /** |signature| (the representative may carry either sign). */
  readonly signature: number;
  /** Alexander coefficients a_0, a_1, ... of the symmetric, Conway-normalised polynomial. */
  readonly alexander: readonly number[];
  readonly amphichiral: boolean;
  readonly source: string;
}

const M = 'from memory';
const e = (name: string, code: { rational?: number[]; dt?: number[] }, determinant: number, signature: number, alexander: number[], amphichiral = false, source = M): KnotEntry => ({ name, ...code, determinant, signature, alexander, amphichiral, source });

export const knotTable: readonly KnotEntry[] = [
  e('3_1', { rational: [3] }, 3, 2, [-1, 1]),
  e('4_1', { rational: [2, 2] }, 5, 0, [3, -1], true),
  e('5_1', { rational: [5] }, 5, 4, [1, -1, 1]),
  e('5_2', { rational: [3, 2] }, 7, 2, [-3, 2]),
  e('6_1', { rational: [4, 2] }, 9, 0, [5, -2]),
  e('6_2', { rational: [3, 1, 2] }, 11, 2, [-3, 3, -1]),
  e('6_3', { rational: [2, 1, 1, 2] }, 13, 0, [5, -3, 1], true),
  e('7_1', { rational: [7] }, 7, 6, [-1, 1, -1, 1]),
  e('7_2', { rational: [5, 2] }, 11, 2, [-5, 3]),
  e('7_3', { rational: [4, 3] }, 13, 4, [3, -3, 2]),
  e('7_4', { rational: [3, 1, 3] }, 15, 2, [-7, 4]),
  e('7_5', { rational: [3, 2, 2] }, 17, 4, [5, -4, 2]),
  e('7_6', { rational: [2, 2, 1, 2] }, 19, 2, [-7, 5, -1]),
  e('7_7', { rational: [2, 1, 1, 1, 2] }, 21, 0, [9, -5, 1]),
  e('8_1', { rational: [6, 2] }, 13, 0, [7, -3]),
  e('8_2', { rational: [5, 1, 2] }, 17, 4, [3, -3, 3, -1]),
  e('8_3', { rational: [4, 4] }, 17, 0, [9, -4], true),
  e('8_4', { rational: [4, 1, 3] }, 19, 2, [-5, 5, -2]),
  e('8_5', { dt: [6, 8, 12, 2, 14, 16, 4, 10] }, 21, 4, [5, -4, 3, -1]),
  e('8_6', { rational: [3, 3, 2] }, 23, 2, [-7, 6, -2]),
  e('8_7', { rational: [4, 1, 1, 2] }, 23, 2, [-5, 5, -3, 1]),
  e('8_8', { rational: [2, 3, 1, 2] }, 25, 0, [9, -6, 2]),
  e('8_9', { rational: [3, 1, 1, 3] }, 25, 0, [7, -5, 3, -1], true),
  e('8_10', { dt: [4, 8, 12, 2, 14, 16, 6, 10] }, 27, 2, [-7, 6, -3, 1]),
  e('8_11', { rational: [3, 2, 1, 2] }, 27, 2, [-9, 7, -2]),
  e('8_12', { rational: [2, 2, 2, 2] }, 29, 0, [13, -7, 1], true),
  e('8_13', { rational: [3, 1, 1, 1, 2] }, 29, 0, [11, -7, 2]),
  // Memory said signature 0; the Alexander polynomial (Delta(-1) = -31 < 0) forces 2 mod 4.
  e('8_14', { rational: [2, 2, 1, 1, 2] }, 31, 2, [-11, 8, -2], false, 'from memory (signature: computed, see comment)'),
  e('8_15', { dt: [4, 8, 12, 2, 14, 6, 16, 10] }, 33, 4, [11, -8, 3]),
  e('8_16', { dt: [6, 8, 14, 12, 4, 16, 2, 10] }, 35, 2, [-9, 8, -4, 1]),
  // 8_17 is only negatively amphichiral (its mirror is its reverse, from memory); for a knot the
  // Jones polynomial cannot see reversal, so as unoriented knots it is listed amphichiral.
  e('8_17', { dt: [6, 8, 12, 14, 4, 16, 2, 10] }, 37, 0, [11, -8, 4, -1], true),
  e('8_18', { dt: [6, 8, 10, 12, 14, 16, 2, 4] }, 45, 0, [13, -10, 5, -1], true),
  e('8_19', { dt: [4, 8, -12, 2, -14, -16, -6, -10] }, 3, 6, [1, 0, -1, 1]),
  e('8_20', { dt: [4, 8, -12, 2, -14, -6, -16, -10] }, 9, 0, [3, -2, 1]),
  e('8_21', { dt: [4, 8, -12, 2, 14, -6, 16, 10] }, 15, 2, [-5, 4, -1]),
];

export function entryDiagram(entry: KnotEntry): Diagram {
  return entry.rational ? rationalLink(entry.rational) : fromDT(entry.dt!);
}

/** The listed Alexander coefficients as a Laurent polynomial. */
export function listedAlexander(entry: KnotEntry): Laurent {
  return Laurent.fromPairs(entry.alexander.flatMap((c, k) => (k === 0 ? [[0, c] as const] : [[k, c] as const, [-k, c] as const])));
}

interface Fingerprint {
  readonly jones: Laurent;
  readonly alexander: Laurent;
  readonly signature: number;
}

let fingerprints: Fingerprint[] | undefined;
const table = (): Fingerprint[] =>
  (fingerprints ??= knotTable.map((entry) => {
    const d = entryDiagram(entry);
    return { jones: jones(d), alexander: alexander(d).polynomial, signature: linkSignature(d) };
  }));

export interface NameGuess {
  /** '3_1', ...; '0_1' for the unknot. */
  readonly name: string;
  readonly mirror: boolean;
  /** e.g. "invariants match 5_2 (mirror)". */
  readonly text: string;
}

/**
 * A guess at the name of a knot diagram, or undefined when it is a link or matches no entry.
 * Pass the Jones polynomial when it is already known, to save computing it again.
 */
export function guessName(d: Diagram, v?: Laurent): NameGuess | undefined {
  if (orient(d.pd).components.length + d.unknots !== 1) return undefined;
  const V = v ?? jones(d);
  if (V.equals(Laurent.one) && linkDeterminant(d) === 1n) return { name: '0_1', mirror: false, text: 'invariants match 0_1 (the unknot)' };
  const mirrored = V.substitute(-1);
  const index = table().findIndex((f) => f.jones.equals(V) || f.jones.equals(mirrored));
  if (index < 0) return undefined;
  const f = table()[index];
  const entry = knotTable[index];
  const mirror = !entry.amphichiral && !f.jones.equals(V);
  if (!alexander(d).polynomial.equals(f.alexander) || linkSignature(d) !== (mirror ? -f.signature : f.signature)) return undefined;
  return { name: entry.name, mirror, text: `invariants match ${entry.name}${mirror ? ' (mirror)' : ''}` };
}
