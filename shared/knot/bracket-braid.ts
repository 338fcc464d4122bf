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
import { catalan, TemperleyLieb, temperleyLieb } from './temperley-lieb';
import { Laurent } from '@/shared/poly/laurent';

/** Most coefficients (matchings times exponents) one limb holds: 32 MB of doubles. */
const MAX_ENTRIES = 2 ** 22;

/** Slots a row has room for at first. */
const FIRST_STRIDE = 8;

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

/**
 * The braid as an element of TL_n: slot i of row s, the coefficient of A^(4 (i - zero) +
 * cls[s] + writhe), is (-1)^neg[s] times limb[base[s] + i], summed over limbs r times
 * 2^(r limbBits). Row s keeps its entries in limb[s stride .. (s + 1) stride), the stride
 * doubling when a window outgrows it (so that the rows stay compact in the cache).
 */
export interface Sweep {
  limbs: Float64Array[];
  /** Window of nonzero slots of each row, empty while lo > hi. */
  lo: Int32Array;
  hi: Int32Array;
  base: Int32Array;
  neg: Uint8Array;
  /** peaks[r][s] bounds |entry| of row s in limb r. */
  peaks: Float64Array[];
  /** Slots 0..width - 1 (the letters plus one) hold every exponent. */
  width: number;
  stride: number;
  zero: number;
  writhe: number;
}

/** The letters applied one by one to the identity, in limbs of doubles (braidSweepFits must hold). */
export function sweep(word: BraidWord, strands: number, precision: Precision = DOUBLES): Sweep {
  const tl = temperleyLieb(strands);
  const { size } = tl;
  // Each positive letter moves exponents down by at most one slot and each negative one up,
  // so the slots 0..letters suffice with the identity's constant term at zero = #positive letters.
  const width = word.length + 1;
  const zero = word.filter((k) => k > 0).length;
  const stride = Math.min(width, FIRST_STRIDE);
  const b: Sweep = {
    limbs: [new Float64Array(size * stride)],
    lo: new Int32Array(size).fill(width),
    hi: new Int32Array(size).fill(-1),
    base: Int32Array.from({ length: size }, (_, s) => s * stride - zero + (stride >> 1)),
    neg: new Uint8Array(size),
    peaks: [new Float64Array(size)],
    width,
    stride,
    zero,
    writhe: word.reduce((g, k) => g + Math.sign(k), 0),
  };
  b.limbs[0][stride >> 1] = 1;
  [b.lo[0], b.hi[0], b.peaks[0][0]] = [zero, zero, 1];
  const limit = 2 ** (precision.exactBits - 1);
  const unit = 2 ** precision.limbBits;
  for (const letter of word) {
    const k = Math.abs(letter) - 1;
    const [image, from, sources] = [tl.image[k], tl.from[k], tl.sources[k]];
    for (let r = unbounded(b, image, from, sources, limit); r >= 0; r = unbounded(b, image, from, sources, limit)) {
      b.limbs = carry(b.limbs, unit, r === b.limbs.length - 1);
      b.peaks = b.limbs.map((limb) => rowPeaks(b, limb));
    }
    letterOn(b, tl, k, letter < 0, limit);
  }
  return b;
}

/**
 * One letter sigma_(k+1)^(+-1): only e_k's image changes. Each row t of the image is first
 * its own entries times -A^(-+3), one slot down (or up) and negated, which only moves the
 * row's base and flips its sign; its window is widened to take its sources, and then each
 * source s times A^(-+1) is added in: two exponents apart, so one slot lower, the same or one
 * higher. Row by row, so that t stays in the cache while its sources are read; last its bound,
 * measured where near the limit, and its window narrowed.
 */
function letterOn(b: Sweep, tl: TemperleyLieb, k: number, up: boolean, limit: number): void {
  const { lo, hi, base, neg } = b;
  const { cls } = tl;
  const [image, from, sources] = [tl.image[k], tl.from[k], tl.sources[k]];
  const shift = up ? 1 : -1;
  for (let j = 0; j < image.length; j++) {
    const t = image[j];
    const live = lo[t] <= hi[t];
    let low = live ? lo[t] + shift : b.width;
    let high = live ? hi[t] + shift : -1;
    for (let x = from[j]; x < from[j + 1]; x++) {
      const s = sources[x];
      if (lo[s] > hi[s]) continue;
      low = Math.min(low, lo[s] + slot(cls, s, t, up));
      high = Math.max(high, hi[s] + slot(cls, s, t, up));
      for (let r = 0; r < b.peaks.length; r++) b.peaks[r][t] += b.peaks[r][s];
    }
    if (low > high) continue;
    if (live) {
      base[t] -= shift;
      neg[t] ^= 1;
      lo[t] += shift;
      hi[t] += shift;
    }
    if (high - low >= b.stride) widen(b, high - low + 1);
    if (base[t] + low < t * b.stride || base[t] + high >= (t + 1) * b.stride) recentre(b, t, low, high);
    lo[t] = low;
    hi[t] = high;
    for (const limb of b.limbs) {
      for (let x = from[j]; x < from[j + 1]; x++) {
        const s = sources[x];
        if (lo[s] > hi[s]) continue;
        const into = base[t] + lo[s] + slot(cls, s, t, up);
        if (neg[s] === neg[t]) addInto(limb, base[s] + lo[s], into, hi[s] - lo[s] + 1);
        else subtractFrom(limb, base[s] + lo[s], into, hi[s] - lo[s] + 1);
      }
    }
    // Loose bounds near the limit would force carries or rescans.
    for (let r = 0; r < b.limbs.length; r++) if (b.peaks[r][t] >= limit / 64) b.peaks[r][t] = rowPeak(b, b.limbs[r], t);
    trim(b, t);
  }
}

/** Slots from s to its image t under e_k: -1, 0 or 1 (the classes differ by 2, the letter's A^(-+1)). */
const slot = (cls: Uint8Array, s: number, t: number, up: boolean): number => (cls[s] - cls[t] + (up ? 2 : -2)) / 4;

function addInto(limb: Float64Array, from: number, to: number, n: number): void {
  for (let i = 0; i < n; i++) limb[to + i] += limb[from + i];
}

function subtractFrom(limb: Float64Array, from: number, to: number, n: number): void {
  for (let i = 0; i < n; i++) limb[to + i] -= limb[from + i];
}

/** Row t's window narrowed to its nonzero entries: cancellation at its ends is common, and later sums skip them. */
function trim({ limbs, lo, hi, base }: Sweep, t: number): void {
  while (lo[t] <= hi[t] && zeroAt(limbs, base[t] + lo[t])) lo[t]++;
  while (lo[t] <= hi[t] && zeroAt(limbs, base[t] + hi[t])) hi[t]--;
}

function zeroAt(limbs: Float64Array[], i: number): boolean {
  for (let r = 0; r < limbs.length; r++) if (limbs[r][i] !== 0) return false;
  return true;
}

/**
 * Row t's entries moved within its block so that the window low..high (which holds its own)
 * is centred there: rare, as a row's base drifts only by one slot a letter.
 */
function recentre({ limbs, lo, hi, base, stride }: Sweep, t: number, low: number, high: number): void {
  const moved = t * stride + Math.floor((stride - (high - low + 1)) / 2) - low;
  if (lo[t] <= hi[t]) {
    const [from, to, n] = [base[t] + lo[t], moved + lo[t], hi[t] - lo[t] + 1];
    for (const limb of limbs) {
      limb.copyWithin(to, from, from + n);
      if (to > from) limb.fill(0, from, Math.min(to, from + n));
      else limb.fill(0, Math.max(from, to + n), from + n);
    }
  }
  base[t] = moved;
}

/** Every row copied to the middle of a block of at least twice the stride and at least slots. */
function widen(b: Sweep, slots: number): void {
  const stride = Math.min(b.width, Math.max(2 * b.stride, slots));
  const { lo, hi, base } = b;
  b.limbs = b.limbs.map((limb) => {
    const wide = new Float64Array(lo.length * stride);
    for (let s = 0; s < lo.length; s++) {
      const moved = s * stride + ((stride - b.stride) >> 1) + base[s] - s * b.stride;
      if (lo[s] <= hi[s]) wide.set(limb.subarray(base[s] + lo[s], base[s] + hi[s] + 1), moved + lo[s]);
    }
    return wide;
  });
  for (let s = 0; s < lo.length; s++) base[s] = s * stride + ((stride - b.stride) >> 1) + base[s] - s * b.stride;
  b.stride = stride;
}

/** The largest |entry| of row s in limb. */
function rowPeak({ lo, hi, base }: Sweep, limb: Float64Array, s: number): number {
  let p = 0;
  for (let i = base[s] + lo[s]; i <= base[s] + hi[s]; i++) p = Math.max(p, Math.abs(limb[i]));
  return p;
}

const rowPeaks = (b: Sweep, limb: Float64Array): Float64Array => Float64Array.from(b.lo, (_, s) => rowPeak(b, limb, s));

/**
 * The first limb in which a partial sum of the letter could be inexact, or -1: a row of e_k's
 * image sums its own entries and its sources', so its bound plus theirs must stay below
 * limit. Bounds that fail are first replaced by the rows' actual peaks.
 */
function unbounded(b: Sweep, image: Int32Array, from: Int32Array, sources: Int32Array, limit: number): number {
  for (let r = 0; r < b.limbs.length; r++) {
    const [limb, peak] = [b.limbs[r], b.peaks[r]];
    const bound = (j: number) => {
      let sum = peak[image[j]];
      for (let x = from[j]; x < from[j + 1]; x++) sum += peak[sources[x]];
      return sum;
    };
    for (let j = 0; j < image.length; j++) {
      if (bound(j) < limit) continue;
      peak[image[j]] = rowPeak(b, limb, image[j]);
      for (let x = from[j]; x < from[j + 1]; x++) peak[sources[x]] = rowPeak(b, limb, sources[x]);
      if (bound(j) >= limit) return r;
    }
  }
  return -1;
}

/**
 * The closure: sum over matchings of their coefficients times (-A^2 - A^-2)^(loops - 1). Rows
 * of one (loops, class) are first added in doubles: exact when the rows' largest entries add
 * up to less than 2^52, else after carrying every limb but the top one below unit/2 (then,
 * with a letter or more, at most 2^21 rows fit in MAX_ENTRIES, so their sums stay below
 * 2^52), and the top one too, into a new limb, while its sums might not be exact.
 */
function markovTrace(braid: Sweep, strands: number, precision: Precision): Laurent {
  const { lo, hi, base, neg, width, zero, writhe } = braid;
  let limbs = braid.limbs;
  const unit = 2 ** precision.limbBits;
  const fits = (peaks: Float64Array[]) => peaks.every((p) => p.reduce((a, b) => a + b, 0) < 2 ** 52);
  const measured = () => limbs.map((limb) => rowPeaks(braid, limb));
  if (!fits(braid.peaks) && !fits(measured())) {
    limbs = carry(limbs, unit, false);
    while (!fits(measured())) limbs = carry(limbs, unit, true);
  }
  const { size, cls, closureLoops } = temperleyLieb(strands);
  const groups = new Map<number, Float64Array[]>(); // 2 loops + cls / 2 -> summed rows, per limb
  for (let s = 0; s < size; s++) {
    if (lo[s] > hi[s]) continue;
    const g = 2 * closureLoops[s] + cls[s] / 2;
    if (!groups.has(g)) groups.set(g, limbs.map(() => new Float64Array(width)));
    const sums = groups.get(g)!;
    const sign = neg[s] ? -1 : 1;
    limbs.forEach((limb, r) => {
      for (let i = lo[s]; i <= hi[s]; i++) sums[r][i] += sign * limb[base[s] + i];
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
