// The Kauffman bracket of a braid closure in the Temperley-Lieb algebra (Kauffman, "State
// models and the Jones polynomial", Topology 26, 1987): sigma_k = A + A^-1 e_k and
// sigma_k^-1 = A^-1 + A e_k act on the basis of temperley-lieb.ts letter by letter, and the
// closure is the Markov trace, sum of the coefficients times (-A^2 - A^-2)^(loops - 1). Since
// e_k sigma_k = -A^-3 e_k, a letter only shifts the matchings in the image of e_k and adds
// every other matching into its image: one sparse update, no matching work. Coefficients are
// exact limbs of doubles with lazy carries, as in bracket-sum.ts.

import { bracket, greedyOrder, loopFactor } from './bracket';
import { BraidWord, braidStrands, checkBraid, fromBraid } from './braid';
import { carry, DOUBLES, Precision } from './bracket-sum';
import { scoreOrder } from './contraction-order';
import { temperleyLieb } from './temperley-lieb';
import { Laurent } from '@/shared/poly/laurent';

/** Most coefficients (matchings times exponents) one limb holds: 32 MB of doubles. */
const MAX_ENTRIES = 2 ** 22;

/** Catalan(n), the number of basis matchings of TL_n. */
const catalan = (n: number): number => (n === 0 ? 1 : (catalan(n - 1) * 2 * (2 * n - 1)) / (n + 1));

/** Whether the Temperley-Lieb sweep's buffers fit for this braid. */
export const braidSweepFits = (strands: number, letters: number): boolean => catalan(strands) * (letters + 1) <= MAX_ENTRIES;

/**
 * <closure of word> (normalised <O> = 1), equal to bracket(fromBraid(word, strands)). The
 * sweep keeps up to Catalan(strands) matchings all along; when the closure's greedy order
 * never cuts 2 strands ends, the general contraction's matchings are fewer and it is used, as
 * it is when the sweep's buffers would not fit.
 */
export function bracketOfBraid(word: BraidWord, strands = braidStrands(word)): Laurent {
  const d = fromBraid(word, strands);
  if (d.pd.length === 0 || !braidSweepFits(strands, word.length) || scoreOrder(d.pd, greedyOrder(d.pd)).widest < 2 * strands) return bracket(d);
  return sweepBracket(word, strands);
}

/** The bracket by the sweep alone (braidSweepFits must hold). */
export function sweepBracket(word: BraidWord, strands = braidStrands(word), precision: Precision = DOUBLES): Laurent {
  checkBraid(word, strands);
  return markovTrace(sweep(word, strands, precision), strands, precision);
}

/** The braid as an element of TL_n: row s, slot i of each limb is a coefficient (see sweep). */
export interface Sweep {
  limbs: Float64Array[];
  /** Window of nonzero slots of each row, empty while lo > hi. */
  lo: Int32Array;
  hi: Int32Array;
  width: number;
  zero: number;
  writhe: number;
}

/** The letters applied one by one to the identity, in limbs of doubles (braidSweepFits must hold). */
export function sweep(word: BraidWord, strands: number, precision: Precision = DOUBLES): Sweep {
  const tl = temperleyLieb(strands);
  const { size, target, cls } = tl;
  // Row s, slot i holds the coefficient of A^(4 (i - zero) + cls[s] + writhe so far): each
  // positive letter moves exponents down by at most one slot and each negative one up, so the
  // slots 0..letters suffice with the identity's constant term at zero = #positive letters.
  const width = word.length + 1;
  const zero = word.filter((k) => k > 0).length;
  const lo = new Int32Array(size).fill(width);
  const hi = new Int32Array(size).fill(-1);
  let limbs: Float64Array[] = [new Float64Array(size * width)];
  limbs[0][zero] = 1;
  [lo[0], hi[0]] = [zero, zero];
  // peaks[r][s] bounds |entry| of row s in limb r; a letter adds the bounds of the rows it
  // sums, so checking them before the letter says whether every partial sum stays exact.
  let peaks: Float64Array[] = [new Float64Array(size)];
  peaks[0][0] = 1;
  const limit = 2 ** (precision.exactBits - 1);
  const unit = 2 ** precision.limbBits;
  for (const letter of word) {
    const k = Math.abs(letter) - 1;
    const row = target.subarray(k * size, (k + 1) * size);
    let next = peaks.map((p) => summedPeaks(p, row));
    if (!next.every(below(limit))) {
      // The bounds are loose (no cancellation): measure, and carry only if still needed.
      peaks = limbs.map((limb) => rowPeaks(limb, lo, hi, width));
      next = peaks.map((p) => summedPeaks(p, row));
      while (!next.every(below(limit))) {
        limbs = carry(limbs, unit, !below(limit)(next[next.length - 1]));
        peaks = limbs.map((limb) => rowPeaks(limb, lo, hi, width));
        next = peaks.map((p) => summedPeaks(p, row));
      }
    }
    const up = letter < 0;
    // First the image of e_k times -A^(-+3): one slot down (or up) and negated.
    for (let t = 0; t < size; t++) {
      if (row[t] !== t || lo[t] > hi[t]) continue;
      for (const limb of limbs) shiftNegate(limb, t * width, lo[t], hi[t], up);
      const d = up ? 1 : -1;
      lo[t] += d;
      hi[t] += d;
    }
    // Then every other matching s, times A^(-+1), into its image: two exponents apart, so
    // in the image's class one slot lower, the same slot, or one higher.
    for (let s = 0; s < size; s++) {
      const t = row[s];
      if (t === s || lo[s] > hi[s]) continue;
      const d = (cls[s] - cls[t] + (up ? 2 : -2)) / 4;
      const [a, b] = [s * width + lo[s], s * width + hi[s]];
      const into = (t - s) * width + d;
      for (const limb of limbs) for (let i = a; i <= b; i++) limb[into + i] += limb[i];
      lo[t] = Math.min(lo[t], lo[s] + d);
      hi[t] = Math.max(hi[t], hi[s] + d);
    }
    peaks = next;
  }
  return { limbs, lo, hi, width, zero, writhe: word.reduce((g, k) => g + Math.sign(k), 0) };
}

/** Row entries lo..hi moved one slot down (or up with up) and negated; the slot left behind cleared. */
function shiftNegate(limb: Float64Array, base: number, lo: number, hi: number, up: boolean): void {
  if (up) {
    for (let i = base + hi; i >= base + lo; i--) limb[i + 1] = -limb[i];
    limb[base + lo] = 0;
  } else {
    for (let i = base + lo; i <= base + hi; i++) limb[i - 1] = -limb[i];
    limb[base + hi] = 0;
  }
}

/** Bounds after a letter whose e_k sends s to row[s]: the image rows gain their sources' bounds. */
function summedPeaks(peak: Float64Array, row: Int32Array): Float64Array {
  const next = Float64Array.from(peak);
  for (let s = 0; s < row.length; s++) if (row[s] !== s) next[row[s]] += peak[s];
  return next;
}

const below = (limit: number) => (peak: Float64Array) => peak.every((p) => p < limit);

/** The largest |entry| of each row. */
function rowPeaks(limb: Float64Array, lo: Int32Array, hi: Int32Array, width: number): Float64Array {
  const peak = new Float64Array(lo.length);
  for (let s = 0; s < lo.length; s++) for (let i = lo[s]; i <= hi[s]; i++) peak[s] = Math.max(peak[s], Math.abs(limb[s * width + i]));
  return peak;
}

function largest(limb: Float64Array): number {
  let p = 0;
  for (let i = 0; i < limb.length; i++) p = Math.max(p, Math.abs(limb[i]));
  return p;
}

/**
 * The closure: sum over matchings of their coefficients times (-A^2 - A^-2)^(loops - 1). Rows
 * of one (loops, class) are first added in doubles: exact when the rows' largest entries add
 * up to less than 2^52, else after carrying every limb below unit/2 (then, with a letter or more,
 * at most 2^21 rows fit in MAX_ENTRIES, so the sums stay below 2^52).
 */
function markovTrace(braid: Sweep, strands: number, precision: Precision): Laurent {
  const { lo, hi, width, zero, writhe } = braid;
  let limbs = braid.limbs;
  const unit = 2 ** precision.limbBits;
  const fits = () => limbs.every((limb) => rowPeaks(limb, lo, hi, width).reduce((a, b) => a + b, 0) < 2 ** 52);
  if (!fits()) {
    while (largest(limbs[limbs.length - 1]) > unit / 2) limbs = carry(limbs, unit, true);
    limbs = carry(limbs, unit, false);
  }
  const { size, cls, closureLoops } = temperleyLieb(strands);
  const groups = new Map<number, Float64Array[]>(); // 2 loops + cls / 2 -> summed rows, per limb
  for (let s = 0; s < size; s++) {
    if (lo[s] > hi[s]) continue;
    const g = 2 * closureLoops[s] + cls[s] / 2;
    if (!groups.has(g)) groups.set(g, limbs.map(() => new Float64Array(width)));
    const sums = groups.get(g)!;
    limbs.forEach((limb, r) => {
      for (let i = lo[s]; i <= hi[s]; i++) sums[r][i] += limb[s * width + i];
    });
  }
  let total = Laurent.zero;
  for (const [g, sums] of groups) {
    const pairs = Array.from({ length: width }, (_, i): [number, bigint] => [
      4 * (i - zero) + 2 * (g & 1) + writhe,
      sums.reduce((x, sum, r) => x + (BigInt(sum[i]) << BigInt(r * precision.limbBits)), 0n),
    ]);
    total = total.add(Laurent.fromPairs(pairs).mul(loopFactor().pow((g >> 1) - 1)));
  }
  return total;
}
