// The combinatorial half of the bracket's tangle contraction (method in bracket.ts): after each
// crossing of the order, the states are the crossingless matchings of the boundary of the
// region contracted so far (Temperley-Lieb diagrams when the region is a disk), and each of the
// crossing's two smoothings sends a state to a state of the next step, closing 0, 1 or 2 loops.
// This graph depends on the code and the order only; bracket-sum.ts sums the polynomials
// along it. Matchings are rows of bytes in a hash table (no strings), and a boundary point
// keeps its place from step to step, so a smoothing rewrites only a few bytes of a row.

import { PDCode } from './pd';

/** The states reached by one crossing of the order. */
export interface Step {
  /** Number of states after the step. */
  size: number;
  /** target[2 s + h]: the state reached from state s of the step before by smoothing h. */
  target: Int32Array;
  /** loops[2 s + h]: the loops that smoothing closes (0, 1 or 2). */
  loops: Uint8Array;
  /** The largest sum of 2^loops over the terms arriving at one state (a bound for bracket-sum.ts). */
  inWeight: number;
}

export interface StateGraph {
  steps: Step[];
  /**
   * 4 when the exponents of each state's polynomial lie in one class mod 4, else 2. In a
   * planar diagram a switch of one smoothing changes A^(a-b) by A^(+-2) and the loops by one,
   * so all its states agree mod 4 (Kauffman 1987); completing a tangle's states by one fixed
   * state of the rest gives the same for each matching. A non-planar code may break it.
   */
  stride: number;
}

/** Smoothing h joins slot s of a crossing to slot SMOOTHINGS[h][s]: A joins a-b and c-d, A^-1 joins a-d and b-c. */
const SMOOTHINGS: readonly (readonly number[])[] = [
  [1, 0, 3, 2],
  [3, 2, 1, 0],
];
/** The power of A each smoothing contributes. */
export const SHIFTS = [1, -1];

/** The state graph of contracting pd's crossings in the given order (every crossing once). */
export function stateGraph(pd: PDCode, order: readonly number[]): StateGraph {
  let boundary: number[] = [];
  let rows: Int32Array = new Int32Array(1);
  let words = 1;
  let size = 1;
  let cls = new Int8Array([0]); // exponent class mod 4 of each state (the start is the polynomial 1)
  let stride = 4;
  const steps: Step[] = [];
  for (const x of order) {
    const g = glueing(boundary, pd[x]);
    const table = new MatchTable(g.boundary.length, 2 * size);
    const target = new Int32Array(2 * size);
    const loops = new Uint8Array(2 * size);
    const nextCls: number[] = [];
    const bytes = new Uint8Array(rows.buffer);
    const q = new Int32Array(table.words);
    const q8 = new Uint8Array(q.buffer);
    const common = Math.min(words, table.words);
    for (let s = 0; s < size; s++) {
      // Most boundary points keep their place and partner: start from the old row. Both
      // smoothings rewrite the same entries, so one copy serves both.
      for (let i = 0; i < common; i++) q[i] = rows[s * words + i];
      for (let i = common; i < table.words; i++) q[i] = 0;
      for (let i = g.boundary.length; i < 4 * common; i++) q8[i] = 0;
      for (let h = 0; h < 2; h++) {
        const l = join(g, bytes, 4 * s * words, h, q8);
        const t = table.indexOf(q);
        target[2 * s + h] = t;
        loops[2 * s + h] = l;
        const c = (cls[s] + SHIFTS[h] - 2 * l) & 3;
        if (t === nextCls.length) nextCls.push(c);
        else if (nextCls[t] !== c) stride = 2;
      }
    }
    const weight = new Float64Array(table.size);
    for (let k = 0; k < target.length; k++) weight[target[k]] += 2 ** loops[k];
    steps.push({ size: table.size, target, loops, inWeight: weight.reduce((a, b) => Math.max(a, b), 0) });
    [boundary, rows, words, size, cls] = [g.boundary, table.rows, table.words, table.size, Int8Array.from(nextCls)];
  }
  return { steps, stride };
}

/**
 * How a crossing meets the boundary. Nodes 0..m-1 are the old boundary points, m..m+3 the
 * crossing's slots; a node is glued to the node with the same label, or free (-1). Old free
 * points keep their index on the new boundary where they can, so a matching changes in a few
 * entries only: the crossing's free slots fill the places of the glued points, and when
 * there are fewer slots than places, old points from the end move into the rest.
 */
interface Glueing {
  m: number;
  glue: Int32Array;
  /** Index on the new boundary of each free node. */
  newIndex: Int32Array;
  /** The free nodes whose entry of the matching must be traced: free slots and moved old points. */
  starts: Int32Array;
  /** The glued old points (their partners' entries change too). */
  gluedOld: Int32Array;
  /** All glued nodes, for counting the loops closed. */
  glued: Int32Array;
  /** Labels of the new boundary. */
  boundary: number[];
  /** Scratch marks: seen[v] === mark while one smoothing of one state is traced. */
  seen: Int32Array;
  mark: number;
}

function glueing(boundary: readonly number[], x: readonly number[]): Glueing {
  const m = boundary.length;
  const glue = new Int32Array(m + 4).fill(-1);
  const glued: number[] = [];
  for (let s = 0; s < 4; s++) {
    const i = boundary.indexOf(x[s]);
    if (i >= 0) [glue[i], glue[m + s]] = [m + s, i];
    else if (x.indexOf(x[s]) !== s) [glue[m + x.indexOf(x[s])], glue[m + s]] = [m + s, m + x.indexOf(x[s])]; // a kink
  }
  for (let v = 0; v < m + 4; v++) if (glue[v] >= 0) glued.push(v);
  const width = m + 4 - glued.length;
  // Matchings are stored in bytes; a cut this wide is far beyond any contraction anyway.
  if (width > 256) throw new RangeError(`a cut of ${width} ends is beyond the bracket's contraction`);
  // Old free points below the new width stay; the other free nodes fill the remaining places in turn.
  const newIndex = new Int32Array(m + 4).fill(-1);
  const starts: number[] = [];
  let place = 0;
  const stays = (v: number) => v < m && v < width && glue[v] < 0;
  for (let v = 0; v < m + 4; v++) {
    if (glue[v] >= 0) continue;
    if (stays(v)) newIndex[v] = v;
    else {
      while (stays(place)) place++;
      newIndex[v] = place++;
      starts.push(v);
    }
  }
  const next = new Array<number>(width);
  for (let v = 0; v < m + 4; v++) if (newIndex[v] >= 0) next[newIndex[v]] = v < m ? boundary[v] : x[v - m];
  return {
    m,
    glue,
    newIndex,
    starts: Int32Array.from(starts),
    gluedOld: Int32Array.from(glued.filter((v) => v < m)),
    glued: Int32Array.from(glued),
    boundary: next,
    seen: new Int32Array(m + 4),
    mark: 0,
  };
}

/**
 * Glues smoothing h of the crossing onto the matching rows[base..base+m-1] (rows[base + u] is
 * u's partner), q holding a copy of it: fixes the entries of q that change and returns the
 * number of loops closed.
 */
function join(g: Glueing, rows: Uint8Array, base: number, h: number, q: Uint8Array): number {
  const { m, glue, starts, gluedOld, glued, seen } = g;
  const smoothing = SMOOTHINGS[h];
  const mark = ++g.mark;
  for (let i = 0; i < starts.length; i++) trace(g, rows, base, smoothing, starts[i], q, mark);
  for (let i = 0; i < gluedOld.length; i++) {
    const u = rows[base + gluedOld[i]];
    if (glue[u] < 0) trace(g, rows, base, smoothing, u, q, mark);
  }
  let loops = 0;
  for (let i = 0; i < glued.length; i++) {
    const start = glued[i];
    if (seen[start] === mark) continue;
    loops++;
    let v = start;
    do {
      seen[v] = mark;
      const u = v < m ? rows[base + v] : m + smoothing[v - m];
      seen[u] = mark;
      v = glue[u];
    } while (v !== start);
  }
  return loops;
}

/** Follows the strand from free node a through glued nodes to the free node at its other end, and matches the two in q. */
function trace(g: Glueing, rows: Uint8Array, base: number, smoothing: readonly number[], a: number, q: Uint8Array, mark: number): void {
  const { m, glue, newIndex, seen } = g;
  let v = a < m ? rows[base + a] : m + smoothing[a - m];
  while (glue[v] >= 0) {
    seen[v] = mark;
    const w = glue[v];
    seen[w] = mark;
    v = w < m ? rows[base + w] : m + smoothing[w - m];
  }
  q[newIndex[a]] = newIndex[v];
  q[newIndex[v]] = newIndex[a];
}

/** The matchings of one step: rows of `words` 32-bit words (the bytes of a matching, zero-padded), found by an open-addressing hash. */
class MatchTable {
  readonly words: number;
  rows: Int32Array;
  size = 0;
  /** Pairs (hash, index) with index -1 for a free pair: a probe reads one place in memory. */
  private slots: Int32Array;

  constructor(width: number, expected: number) {
    this.words = Math.max(1, Math.ceil(width / 4));
    this.rows = new Int32Array(this.words * Math.max(expected, 1));
    this.slots = new Int32Array(2 * 2 ** Math.ceil(Math.log2(2 * expected + 2))).fill(-1);
  }

  /** The index of matching q, added if it is new. */
  indexOf(q: Int32Array): number {
    const { words, slots, rows } = this;
    let hash = 0x811c9dc5 | 0;
    for (let i = 0; i < words; i++) hash = Math.imul(hash ^ q[i], 16777619);
    // A multiplication mixes only upwards: fold the high bits into the low ones the slot uses.
    hash = Math.imul(hash ^ (hash >>> 16), 0x45d9f3b);
    hash ^= hash >>> 16;
    const mask = slots.length / 2 - 1;
    for (let at = hash & mask; ; at = (at + 1) & mask) {
      const k = slots[2 * at + 1];
      if (k < 0) {
        // At most `expected` matchings arrive (two successors per state), so nothing grows and
        // the slots stay at most half full.
        slots[2 * at] = hash;
        slots[2 * at + 1] = this.size;
        for (let i = 0; i < words; i++) rows[this.size * words + i] = q[i];
        return this.size++;
      }
      if (slots[2 * at] !== hash) continue;
      let same = true;
      for (let i = 0; i < words && same; i++) same = rows[k * words + i] === q[i];
      if (same) return k;
    }
  }
}
