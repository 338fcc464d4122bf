// Kauffman bracket by tangle contraction (Bar-Natan's local "planar algebra" approach, as in
// D. Bar-Natan, "Fast Khovanov homology computations", 2007, arXiv math/0606318, applied to the
// bracket): crossings are added one at a time in a greedy order that keeps the cut small; the
// running tangle is a sum over crossingless matchings of its boundary, so the cost grows with
// the number of matchings of the widest cut, not with 2^crossings.

import { Diagram } from './diagram';
import { Laurent } from '@/shared/poly/laurent';
import { PDCode } from './pd';
import { contractionOrder, scoreOrder } from './contraction-order';

/** A dense polynomial in A: sum of c[i] A^(off + i). */
interface Dense<T> {
  off: number;
  c: T[];
}

/** The coefficient arithmetic: doubles while they are provably exact, else bigints. */
interface Ring<T> {
  zero: T;
  one: T;
  /** Largest |coefficient| of c, for a ring whose exactness has a limit. */
  maxAbs?: (c: T[]) => number;
  add(a: T, b: T): T;
  neg(a: T): T;
  big(a: T): bigint;
}
const DOUBLES: Ring<number> = { zero: 0, one: 1, maxAbs: (c) => c.reduce((m, x) => Math.max(m, Math.abs(x)), 0), add: (a, b) => a + b, neg: (a) => -a, big: (a) => BigInt(a) };
const BIGINTS: Ring<bigint> = { zero: 0n, one: 1n, add: (a, b) => a + b, neg: (a) => -a, big: (a) => a };

/** The Kauffman bracket <D> in A, normalised so that <O> = 1 (docs/conventions.md). */
export function bracket(d: Diagram): Laurent {
  return bracketOfPD(d.pd, d.unknots);
}

/** <pd> times (-A^2 - A^-2)^unknots; the empty code with no unknots is taken as the empty link, 1. */
export function bracketOfPD(pd: PDCode, unknots = 0): Laurent {
  if (pd.length === 0) return loopFactor().pow(Math.max(unknots - 1, 0));
  const order = cheaperOrder(pd);
  const closed = contract(pd, order, DOUBLES) ?? contract(pd, order, BIGINTS)!;
  // Every state has at least one loop; one of them is the normalising <O> = 1.
  const p = divideByLoop({ off: closed.off, c: closed.c });
  return Laurent.fromDense(p.c, p.off).mul(loopFactor().pow(unknots));
}

/** Up to this cut the greedy order is cheap enough that a search for a better one does not pay. */
const NARROW = 10;

/** The greedy order below or the tree-decomposition order, whichever costs less. */
function cheaperOrder(pd: PDCode): number[] {
  const greedy = greedyOrder(pd);
  const score = scoreOrder(pd, greedy);
  if (score.widest <= NARROW) return greedy;
  const tree = contractionOrder(pd);
  return tree.cost < score.cost ? tree.order : greedy;
}

/**
 * The closed tangle's sum over states, in bigints; undefined when doubles were asked for and
 * could lose exactness. A new coefficient sums at most 2 * states terms, each at most 4 times an
 * old coefficient (a crossing closes at most two loops, and (A^2 + A^-2)^2 has coefficients
 * up to 2 summed over 2 terms), so 8 * states * max|c| < 2^53 keeps every partial sum exact.
 */
function contract<T>(pd: PDCode, order: number[], ring: Ring<T>): Dense<bigint> | undefined {
  let states = new Map<string, { match: number[]; poly: Dense<T> }>([['', { match: [], poly: { off: 0, c: [ring.one] } }]]);
  let boundary: number[] = [];
  for (const x of order) {
    if (ring.maxAbs && 8 * states.size * maxAbs(ring.maxAbs, states.values()) >= 2 ** 53) return undefined;
    const step = prepare(boundary, pd[x]);
    const next = new Map<string, { match: number[]; poly: Dense<T> }>();
    for (const { match, poly } of states.values()) {
      for (const [smoothing, shift] of SMOOTHINGS) {
        const { match: q, loops } = join(step, match, smoothing);
        const key = String.fromCharCode(...q);
        let target = next.get(key);
        if (!target) next.set(key, (target = { match: q, poly: { off: 0, c: [] } }));
        addTerm(ring, target.poly, poly, shift, loops);
      }
    }
    states = next;
    boundary = step.boundary;
  }
  const closed = states.get('')!.poly;
  return { off: closed.off, c: closed.c.map(ring.big) };
}

function maxAbs<T>(of: (c: T[]) => number, states: Iterable<{ poly: Dense<T> }>): number {
  let m = 0;
  for (const { poly } of states) m = Math.max(m, of(poly.c));
  return m;
}

// target += A^shift (-A^2 - A^-2)^loops p, in place (loops is 0, 1 or 2).
function addTerm<T>(ring: Ring<T>, target: Dense<T>, p: Dense<T>, shift: number, loops: number): void {
  const off = p.off + shift - 2 * loops;
  widen(ring, target, off, off + p.c.length + 4 * loops);
  const t = target.c;
  const c = p.c;
  const base = off - target.off;
  const { add, neg } = ring;
  for (let i = 0; i < c.length; i++) {
    const x = c[i];
    const j = base + i;
    if (loops === 0) t[j] = add(t[j], x);
    else if (loops === 1) {
      t[j] = add(t[j], neg(x));
      t[j + 4] = add(t[j + 4], neg(x));
    } else {
      t[j] = add(t[j], x);
      t[j + 4] = add(t[j + 4], add(x, x));
      t[j + 8] = add(t[j + 8], x);
    }
  }
}

// Makes target.c cover exponents lo..hi-1.
function widen<T>(ring: Ring<T>, target: Dense<T>, lo: number, hi: number): void {
  if (target.c.length === 0) {
    target.off = lo;
    target.c = new Array<T>(hi - lo).fill(ring.zero);
    return;
  }
  const end = target.off + target.c.length;
  if (lo < target.off) {
    target.c = [...new Array<T>(target.off - lo).fill(ring.zero), ...target.c];
    target.off = lo;
  }
  if (hi > end) target.c.push(...new Array<T>(hi - end).fill(ring.zero));
}

/** -A^2 - A^-2, the value of a circle. */
export const loopFactor = (): Laurent => Laurent.fromPairs([[2, -1], [-2, -1]]);

// A-smoothing joins a-b and c-d, the A^-1 smoothing joins a-d and b-c (slot partners 0..3).
const SMOOTHINGS: readonly (readonly [readonly number[], number])[] = [
  [[1, 0, 3, 2], 1],
  [[3, 2, 1, 0], -1],
];

interface Step {
  /** Old boundary nodes are 0..m-1, the crossing's slots m..m+3. */
  m: number;
  /** The node a node is glued to (same edge label), or -1 if it stays on the boundary. */
  glue: number[];
  /** Index on the new boundary of each boundary node. */
  newIndex: number[];
  boundary: number[];
}

function prepare(boundary: number[], x: readonly number[]): Step {
  const m = boundary.length;
  const glue = new Array<number>(m + 4).fill(-1);
  x.forEach((label, s) => {
    const i = boundary.indexOf(label);
    const t = x.indexOf(label) === s ? x.lastIndexOf(label) : x.indexOf(label);
    if (i >= 0) {
      glue[i] = m + s;
      glue[m + s] = i;
    } else if (t !== s) glue[m + s] = m + t;
  });
  const newIndex = new Array<number>(m + 4).fill(-1);
  const labels = [...boundary, ...x];
  const next: number[] = [];
  glue.forEach((g, node) => {
    if (g === -1) {
      newIndex[node] = next.length;
      next.push(labels[node]);
    }
  });
  return { m, glue, newIndex, boundary: next };
}

// Glues one smoothing of the crossing onto a boundary matching: the new matching and the
// number of closed loops formed.
function join(step: Step, match: number[], smoothing: readonly number[]): { match: number[]; loops: number } {
  const { m, glue, newIndex } = step;
  const partner = (u: number) => (u < m ? match[u] : m + smoothing[u - m]);
  const seen = new Uint8Array(m + 4);
  const q = new Array<number>(step.boundary.length);
  for (let u = 0; u < m + 4; u++) {
    if (glue[u] !== -1 || seen[u]) continue;
    let v = partner(u);
    seen[u] = 1;
    while (glue[v] !== -1) {
      seen[v] = 1;
      v = glue[v];
      seen[v] = 1;
      v = partner(v);
    }
    seen[v] = 1;
    q[newIndex[u]] = newIndex[v];
    q[newIndex[v]] = newIndex[u];
  }
  let loops = 0;
  for (let u = 0; u < m + 4; u++) {
    if (seen[u]) continue;
    loops++;
    let v = u;
    do {
      seen[v] = 1;
      v = partner(v);
      seen[v] = 1;
      v = glue[v];
    } while (v !== u);
  }
  return { match: q, loops };
}

// Greedy order: next the crossing with most edges on the current boundary, which keeps the cut
// small; among those, the one touching the longest-open edge, so the cut sweeps the diagram.
function greedyOrder(pd: PDCode): number[] {
  const left = new Set(pd.map((_, i) => i));
  const opened = new Map<number, number>(); // boundary label -> step at which it opened
  const closed = new Set<number>();
  const order: number[] = [];
  while (left.size > 0) {
    let best = -1;
    let bestScore = -Infinity;
    for (const i of left) {
      const shared = pd[i].filter((l) => opened.has(l));
      const oldest = Math.min(...shared.map((l) => opened.get(l)!), pd.length);
      const score = shared.length * (pd.length + 1) - oldest;
      if (score > bestScore) [best, bestScore] = [i, score];
    }
    left.delete(best);
    for (const l of pd[best]) {
      if (opened.has(l) || closed.has(l)) {
        opened.delete(l);
        closed.add(l);
      } else opened.set(l, order.length);
    }
    order.push(best);
  }
  return order;
}

// p / (-A^2 - A^-2) = -A^2 p / (1 + A^4); exact because every state closed at least one loop.
function divideByLoop(p: Dense<bigint>): Dense<bigint> {
  const c = p.c;
  const q = new Array<bigint>(Math.max(c.length - 4, 0)).fill(0n);
  for (let i = 0; i < q.length; i++) q[i] = c[i] - (i >= 4 ? q[i - 4] : 0n);
  return { off: p.off + 2, c: q.map((x) => -x) };
}
