// The Kauffman bracket of a braid closure in the Temperley-Lieb algebra (Kauffman, "State
// models and the Jones polynomial", Topology 26, 1987): sigma_k = A + A^-1 e_k and
// sigma_k^-1 = A^-1 + A e_k act letter by letter on each standard module of temperley-lieb.ts,
// and the closure is the Markov trace, the modules' traces weighted by the quantum dimensions
// [p + 1] (Goodman, de la Harpe and Jones, "Coxeter graphs and towers of algebras", 1989),
// divided by one loop for <O> = 1. Since e_k sigma_k = -A^-3 e_k, a letter only shifts the
// states in the image of e_k and adds every other state into its image. The braid's matrix
// on a module is kept by rows, all the columns of a row under one window of exponents, so a
// letter is one long sum per row of the module rather than one per entry. Coefficients are
// exact limbs of doubles with lazy carries, as in bracket-sum.ts.

import { bracket, Dense, divideByLoop, greedyOrder, loopFactor } from './bracket';
import { BraidWord, braidStrands, checkBraid, fromBraid } from './braid';
import { carry, DOUBLES, Precision } from './bracket-sum';
import { scoreOrder } from './contraction-order';
import { catalan, StandardModule, standardModules } from './temperley-lieb';
import { Laurent } from '@/shared/poly/laurent';

/** Most coefficients (entries times exponents) one limb holds: 32 MB of doubles. */
const MAX_ENTRIES = 2 ** 22;

/**
 * Slots a column has room for at first (never more than the word's width): windows of a long
 * word reach tens of slots, and each widening allocates and faults in the whole buffer anew.
 */
const FIRST_STRIDE = 64;

/** Whether the Temperley-Lieb sweep's buffers fit for this braid (the modules hold Catalan(strands) entries). */
export const braidSweepFits = (strands: number, letters: number): boolean => catalan(strands) * (letters + 1) <= MAX_ENTRIES;

/**
 * <closure of word> (normalised <O> = 1), equal to bracket(fromBraid(word, strands)). The
 * sweep keeps up to Catalan(strands) entries all along; when the closure's greedy order
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
  const modules = standardModules(strands);
  const traced = sweep(word, strands, precision).reduce((sum, b, i) => sum.add(trace(b, precision).mul(quantumDimension(modules[i].through))), Laurent.zero);
  const p = divideByLoop(dense(traced));
  return Laurent.fromDense(p.c, p.off);
}

/**
 * The braid's matrix on one module: slot i of column v of row u, the coefficient of state u in
 * the image of state v at A^(4 (i - zero) + cls[u] - cls[v] + writhe), is (-1)^neg[u] times
 * limb[base[u] + v stride + i], summed over limbs r times 2^(r limbBits). Row u keeps its
 * entries in limb[u cols stride .. (u + 1) cols stride), column v from v stride on, the stride
 * doubling when a window outgrows it (so that the rows stay compact in the cache).
 */
export interface Sweep {
  limbs: Float64Array[];
  /** Window of slots of each row, the same in all its columns; empty while lo > hi. */
  lo: Int32Array;
  hi: Int32Array;
  base: Int32Array;
  neg: Uint8Array;
  /** peaks[r][u] bounds |entry| of row u in limb r. */
  peaks: Float64Array[];
  /** Columns of a row: the module's size. */
  cols: number;
  /** Slots 0..width - 1 (the letters plus one) hold every exponent. */
  width: number;
  stride: number;
  zero: number;
  writhe: number;
}

/** The letters applied one by one to the identity of each module, in limbs of doubles (braidSweepFits must hold). */
export function sweep(word: BraidWord, strands: number, precision: Precision = DOUBLES): Sweep[] {
  return standardModules(strands).map((m) => moduleSweep(word, m, precision));
}

function moduleSweep(word: BraidWord, m: StandardModule, precision: Precision): Sweep {
  const { size } = m;
  // Each positive letter moves exponents down by at most one slot and each negative one up,
  // so the slots 0..letters suffice with the identity's constant term at zero = #positive letters.
  const width = word.length + 1;
  const zero = word.filter((k) => k > 0).length;
  const stride = Math.min(width, FIRST_STRIDE);
  const block = size * stride;
  const b: Sweep = {
    limbs: [new Float64Array(size * block)],
    lo: new Int32Array(size).fill(zero),
    hi: new Int32Array(size).fill(zero),
    base: Int32Array.from({ length: size }, (_, u) => u * block - zero + (stride >> 1)),
    neg: new Uint8Array(size),
    peaks: [new Float64Array(size).fill(1)],
    cols: size,
    width,
    stride,
    zero,
    writhe: word.reduce((g, k) => g + Math.sign(k), 0),
  };
  for (let u = 0; u < size; u++) b.limbs[0][b.base[u] + u * stride + zero] = 1;
  const limit = 2 ** (precision.exactBits - 1);
  const unit = 2 ** precision.limbBits;
  for (const letter of word) {
    const k = Math.abs(letter) - 1;
    for (let r = unbounded(b, m, k, limit); r >= 0; r = unbounded(b, m, k, limit)) {
      b.limbs = carry(b.limbs, unit, r === b.limbs.length - 1);
      b.peaks = b.limbs.map((limb) => Float64Array.from(b.lo, (_, u) => rowPeak(b, limb, u)));
    }
    letterOn(b, m, k, letter < 0);
  }
  return b;
}

/**
 * One letter sigma_(k+1)^(+-1): only e_k's image changes. Each row t of the image is first
 * its own entries times -A^(-+3), one slot down (or up) and negated, which only moves the
 * row's base and flips its sign; its window is widened to take its sources, and then each
 * source s times A^(-+1) is added in: two exponents apart, so one slot lower, the same or one
 * higher, in every column at once. Last its window is narrowed.
 */
function letterOn(b: Sweep, m: StandardModule, k: number, up: boolean): void {
  const { lo, hi, base, neg } = b;
  const { cls } = m;
  const [image, from, sources] = [m.image[k], m.from[k], m.sources[k]];
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
    }
    if (low > high) continue;
    if (live) {
      base[t] -= shift;
      neg[t] ^= 1;
      lo[t] += shift;
      hi[t] += shift;
    }
    if (high - low >= b.stride) widen(b, high - low + 1);
    const start = t * b.cols * b.stride;
    if (base[t] + low < start || base[t] + high >= start + b.stride) recentre(b, t, low, high);
    lo[t] = low;
    hi[t] = high;
    for (let r = 0; r < b.limbs.length; r++) {
      const limb = b.limbs[r];
      // Row t's own entries keep their sizes; every entry the sums write is bounded by the
      // largest partial sum, measured as it is written (a bound as tight as the row's peak
      // and without a second pass over the row).
      let peak = b.peaks[r][t];
      for (let x = from[j]; x < from[j + 1]; x++) {
        const s = sources[x];
        if (lo[s] > hi[s]) continue;
        const into = base[t] + lo[s] + slot(cls, s, t, up);
        const n = hi[s] - lo[s] + 1;
        const written = neg[s] === neg[t] ? addInto(limb, base[s] + lo[s], into, n, b.cols, b.stride) : subtractFrom(limb, base[s] + lo[s], into, n, b.cols, b.stride);
        peak = Math.max(peak, written);
      }
      b.peaks[r][t] = peak;
    }
    trim(b, t);
  }
}

/** Slots from s to its image t under e_k: -1, 0 or 1 (the classes differ by 2, the letter's A^(-+1)). */
const slot = (cls: Uint8Array, s: number, t: number, up: boolean): number => (cls[s] - cls[t] + (up ? 2 : -2)) / 4;

/**
 * n slots of each of cols columns stride apart: column by column, since a window is often much
 * narrower than the stride. Returns the largest |sum| written.
 */
function addInto(limb: Float64Array, from: number, to: number, n: number, cols: number, stride: number): number {
  let peak = 0;
  for (let end = from + cols * stride; from < end; from += stride, to += stride) {
    for (let i = 0; i < n; i++) {
      const x = limb[to + i] + limb[from + i];
      limb[to + i] = x;
      peak = Math.max(peak, Math.abs(x));
    }
  }
  return peak;
}

function subtractFrom(limb: Float64Array, from: number, to: number, n: number, cols: number, stride: number): number {
  let peak = 0;
  for (let end = from + cols * stride; from < end; from += stride, to += stride) {
    for (let i = 0; i < n; i++) {
      const x = limb[to + i] - limb[from + i];
      limb[to + i] = x;
      peak = Math.max(peak, Math.abs(x));
    }
  }
  return peak;
}

/** Row t's window narrowed to the slots nonzero in some column: cancellation at its ends is common, and later sums skip them. */
function trim(b: Sweep, t: number): void {
  const { lo, hi, base } = b;
  while (lo[t] <= hi[t] && zeroAt(b, base[t] + lo[t])) lo[t]++;
  while (lo[t] <= hi[t] && zeroAt(b, base[t] + hi[t])) hi[t]--;
}

function zeroAt({ limbs, cols, stride }: Sweep, i: number): boolean {
  for (const limb of limbs) for (let v = 0; v < cols; v++) if (limb[i + v * stride] !== 0) return false;
  return true;
}

/**
 * Row t's entries moved within its block so that the window low..high (which holds its own)
 * is centred in each column: rare, as a row's base drifts only by one slot a letter.
 */
function recentre({ limbs, lo, hi, base, cols, stride }: Sweep, t: number, low: number, high: number): void {
  const moved = t * cols * stride + Math.floor((stride - (high - low + 1)) / 2) - low;
  if (lo[t] <= hi[t]) {
    const [from, to, n] = [base[t] + lo[t], moved + lo[t], (cols - 1) * stride + hi[t] - lo[t] + 1];
    for (const limb of limbs) {
      limb.copyWithin(to, from, from + n);
      if (to > from) limb.fill(0, from, Math.min(to, from + n));
      else limb.fill(0, Math.max(from, to + n), from + n);
    }
  }
  base[t] = moved;
}

/** Every column copied to the middle of a block of at least twice the stride and at least slots. */
function widen(b: Sweep, slots: number): void {
  const stride = Math.min(b.width, Math.max(2 * b.stride, slots));
  const { lo, hi, base, cols } = b;
  const moved = Int32Array.from(base, (x, u) => u * cols * stride + ((stride - b.stride) >> 1) + x - u * cols * b.stride);
  b.limbs = b.limbs.map((limb) => {
    const wide = new Float64Array(lo.length * cols * stride);
    for (let u = 0; u < lo.length; u++) {
      for (let v = 0; v < cols; v++) {
        const [from, to] = [base[u] + v * b.stride, moved[u] + v * stride];
        for (let i = lo[u]; i <= hi[u]; i++) wide[to + i] = limb[from + i];
      }
    }
    return wide;
  });
  base.set(moved);
  b.stride = stride;
}

/** The largest |entry| of row u in limb. */
function rowPeak({ lo, hi, base, cols, stride }: Sweep, limb: Float64Array, u: number): number {
  let p = 0;
  for (let v = 0; v < cols; v++) for (let i = base[u] + v * stride + lo[u]; i <= base[u] + v * stride + hi[u]; i++) p = Math.max(p, Math.abs(limb[i]));
  return p;
}

/**
 * The first limb in which a partial sum of the letter could be inexact, or -1: a row of e_k's
 * image sums its own entries and its sources', so its bound plus theirs must stay below
 * limit. Bounds that fail are first replaced by the rows' actual peaks.
 */
function unbounded(b: Sweep, m: StandardModule, k: number, limit: number): number {
  const [image, from, sources] = [m.image[k], m.from[k], m.sources[k]];
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

/** The module's trace: its diagonal entries, each at A^(4 (i - zero) + writhe), i the slot. */
function trace(b: Sweep, precision: Precision): Laurent {
  const c = new Array<bigint>(4 * (b.width - 1) + 1).fill(0n);
  for (let r = 0; r < b.limbs.length; r++) {
    const sums = diagonal(b, r, precision);
    const shift = BigInt(r * precision.limbBits);
    for (let i = 0; i < b.width; i++) if (sums[i] !== 0n) c[4 * i] += sums[i] << shift;
  }
  return Laurent.fromDense(c, b.writhe - 4 * b.zero);
}

/**
 * Limb r's diagonal, signed and summed slot by slot over the rows: in doubles (big integers
 * only at the end, one per slot) when the rows' peaks add up below 2^exactBits, else in big
 * integers entry by entry.
 */
function diagonal({ limbs, peaks, lo, hi, base, neg, cols, stride, width }: Sweep, r: number, precision: Precision): bigint[] {
  const limb = limbs[r];
  let bound = 0;
  for (let u = 0; u < cols; u++) if (lo[u] <= hi[u]) bound += peaks[r][u];
  if (bound >= 2 ** precision.exactBits) {
    const big = new Array<bigint>(width).fill(0n);
    for (let u = 0; u < cols; u++) for (let i = lo[u], at = base[u] + u * stride; i <= hi[u]; i++) big[i] += BigInt(neg[u] ? -limb[at + i] : limb[at + i]);
    return big;
  }
  const sums = new Float64Array(width);
  for (let u = 0; u < cols; u++) {
    const [at, sign] = [base[u] + u * stride, neg[u] ? -1 : 1];
    for (let i = lo[u]; i <= hi[u]; i++) sums[i] += sign * limb[at + i];
  }
  return Array.from(sums, (x) => BigInt(x));
}

/** [p + 1], the closure of p parallel strands: 1, delta, delta^2 - 1, ... with delta = -A^2 - A^-2 (Chebyshev). */
function quantumDimension(p: number): Laurent {
  let [previous, current] = [Laurent.zero, Laurent.one];
  for (let i = 0; i < p; i++) [previous, current] = [current, current.mul(loopFactor()).sub(previous)];
  return current;
}

/** A Laurent polynomial written densely from its lowest exponent. */
function dense(p: Laurent): Dense {
  const { min, max } = p.span() ?? { min: 0, max: -1 };
  const c = new Array<bigint>(max - min + 1).fill(0n);
  for (const [e, x] of p.toPairs()) c[e - min] = x;
  return { off: min, c };
}
