// The numeric half of the bracket's tangle contraction (method in bracket.ts): sums each
// state's polynomial along the state graph of bracket-states.ts, exactly, in doubles. A
// double holds every integer below 2^53, so a coefficient is kept as limbs
// x0 + x1 2^32 + x2 2^64 + ...; before each step a bound on every partial sum, computed from
// the actual sizes of the states' limbs, says whether the step stays exact, and if not the
// carries are propagated first (adding a limb when the top one is too large): lazy carry
// propagation, common practice for multi-precision sums. Big integers appear only at the end.

import { SHIFTS, StateGraph, Step } from './bracket-states';

/** How far doubles are trusted, and the size of a limb; tests lower both to exercise the carries. */
export interface Precision {
  /** Every partial sum stays below 2^exactBits in size. */
  exactBits: number;
  /** Limbs below the top one are carried down to at most 2^(limbBits - 1) in size. */
  limbBits: number;
}

export const DOUBLES: Precision = { exactBits: 53, limbBits: 32 };

/** Coefficient i is that of A^(off + stride i). */
export interface Strided {
  off: number;
  c: bigint[];
  /** How many limbs the largest partial sums needed. */
  limbs: number;
}

/** The closed diagram's sum over all states of A^(a - b) (-A^2 - A^-2)^loops. */
export function closedSum(graph: StateGraph, precision = DOUBLES): Strided {
  const { stride, steps } = graph;
  const limit = 2 ** (precision.exactBits - 1); // half the exact range: room for the bound's own rounding
  const unit = 2 ** precision.limbBits;
  let at: Windows = { off: Int32Array.of(0), len: Int32Array.of(1), start: Int32Array.of(0), total: 1 };
  let limbs: Float64Array[] = [Float64Array.of(1)];
  let peaks = [1]; // a bound on |entry| in each limb
  for (const step of steps) {
    const next = windows(step, at, stride);
    // First the bound from the largest entries alone (measured only when the bound carried
    // over from the last step is too loose), then the one state by state; if that fails,
    // carry into the top limb, and only while that is not enough into new ones (one may not
    // do when a state's terms weigh more than a limb's unit).
    const exact = () => peaks.every((p) => p * step.inWeight < limit);
    if (!exact()) peaks = limbs.map(peakOf);
    if (!exact() && !fits(step, limbs, at, limit)) {
      limbs = carry(limbs, unit, false);
      while (!fits(step, limbs, at, limit)) {
        if (peakOf(limbs[limbs.length - 1]) <= unit / 2) throw new RangeError('too many states meet at one matching for an exact sum');
        limbs = carry(limbs, unit, true);
      }
      peaks = limbs.map(peakOf);
    }
    limbs = limbs.map((limb) => accumulate(step, at, next, stride, limb));
    // Each new entry sums terms of total weight at most inWeight.
    peaks = peaks.map((p) => p * step.inWeight);
    at = next;
  }
  // The last step leaves one state, the empty matching.
  const c = Array.from({ length: at.len[0] }, (_, i) => limbs.reduce((sum, limb, r) => sum + (BigInt(limb[at.start[0] + i]) << BigInt(r * precision.limbBits)), 0n));
  return { off: at.off[0], c, limbs: limbs.length };
}

/** The largest |entry| (a plain loop: reduce over a typed array costs as much as the step's sums). */
function peakOf(limb: Float64Array): number {
  let p = 0;
  for (let i = 0; i < limb.length; i++) p = Math.max(p, Math.abs(limb[i]));
  return p;
}

/** Where each state's polynomial lies: exponents off[s] + stride i, entries start[s] + i, i < len[s]. */
interface Windows {
  off: Int32Array;
  len: Int32Array;
  start: Int32Array;
  total: number;
}

// A term A^shift (-A^2 - A^-2)^loops p spans the exponents of p shifted by shift - 2 loops, plus 4 loops.
const base = (at: Windows, step: Step, k: number): number => at.off[k >> 1] + SHIFTS[k & 1] - 2 * step.loops[k];

/** The windows of the step's states: the union of what their incoming terms span. */
function windows(step: Step, at: Windows, stride: number): Windows {
  const { size, target, loops } = step;
  const lo = new Int32Array(size).fill(2 ** 31 - 1);
  const hi = new Int32Array(size).fill(-(2 ** 31));
  for (let k = 0; k < target.length; k++) {
    const t = target[k];
    const b = base(at, step, k);
    lo[t] = Math.min(lo[t], b);
    hi[t] = Math.max(hi[t], b + stride * (at.len[k >> 1] - 1) + 4 * loops[k]);
  }
  const len = new Int32Array(size);
  const start = new Int32Array(size);
  let total = 0;
  for (let t = 0; t < size; t++) {
    start[t] = total;
    len[t] = (hi[t] - lo[t]) / stride + 1;
    total += len[t];
  }
  return { off: lo, len, start, total };
}

/**
 * Whether every partial sum of the step stays below limit in every limb: an entry of a term
 * with l loops adds up to 2^l entries of its source ((-1 - A^4) and (1 + 2 A^4 + A^8)).
 */
function fits(step: Step, limbs: Float64Array[], at: Windows, limit: number): boolean {
  const { size, target, loops } = step;
  return limbs.every((limb) => {
    const peak = new Float64Array(at.len.length);
    for (let s = 0; s < peak.length; s++) {
      for (let i = at.start[s]; i < at.start[s] + at.len[s]; i++) peak[s] = Math.max(peak[s], Math.abs(limb[i]));
    }
    const bound = new Float64Array(size);
    for (let k = 0; k < target.length; k++) bound[target[k]] += peak[k >> 1] * 2 ** loops[k];
    return bound.every((b) => b < limit);
  });
}

/**
 * The same numbers with every limb but the top one in [-unit/2, unit/2], in place; with grow,
 * a new top limb takes the old top's carries.
 */
export function carry(limbs: Float64Array[], unit: number, grow: boolean): Float64Array[] {
  const out = grow ? [...limbs, new Float64Array(limbs[0].length)] : limbs;
  for (let r = 0; r + 1 < out.length; r++) {
    const [low, high] = [out[r], out[r + 1]];
    for (let i = 0; i < low.length; i++) {
      const c = Math.round(low[i] / unit); // exact: unit is a power of two
      low[i] -= c * unit;
      high[i] += c;
    }
  }
  return out;
}

/** One limb of the step's sums: every transition's term added into its target's window. */
function accumulate(step: Step, at: Windows, next: Windows, stride: number, limb: Float64Array): Float64Array {
  const { target, loops } = step;
  const four = 4 / stride; // index distance of A^4
  const sum = new Float64Array(next.total);
  for (let k = 0; k < target.length; k++) {
    const s = k >> 1;
    const t = target[k];
    const into = next.start[t] + (base(at, step, k) - next.off[t]) / stride;
    const from = at.start[s];
    const n = at.len[s];
    // (-A^2 - A^-2)^l with its A^(-2 l) in `into`: 1, -(1 + A^4), 1 + 2 A^4 + A^8.
    if (loops[k] === 0) for (let i = 0; i < n; i++) sum[into + i] += limb[from + i];
    else if (loops[k] === 1) {
      for (let i = 0; i < n; i++) {
        sum[into + i] -= limb[from + i];
        sum[into + i + four] -= limb[from + i];
      }
    } else {
      for (let i = 0; i < n; i++) {
        const x = limb[from + i];
        sum[into + i] += x;
        sum[into + i + four] += 2 * x;
        sum[into + i + 2 * four] += x;
      }
    }
  }
  return sum;
}
