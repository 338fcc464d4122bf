// Kauffman bracket by tangle contraction (Bar-Natan's local "planar algebra" approach, as in
// D. Bar-Natan, "Fast Khovanov homology computations", 2007, arXiv math/0606318, applied to the
// bracket): crossings are added one at a time in a greedy order that keeps the cut small; the
// running tangle is a sum over crossingless matchings of its boundary, so the cost grows with
// the number of matchings of the widest cut, not with 2^crossings.

import { Diagram } from './diagram';
import { Laurent } from '@/shared/poly/laurent';
import { PDCode } from './pd';

/** A dense polynomial in A: sum of c[i] A^(off + i). */
interface Dense {
  off: number;
  c: bigint[];
}

/** The Kauffman bracket <D> in A, normalised so that <O> = 1 (docs/conventions.md). */
export function bracket(d: Diagram): Laurent {
  return bracketOfPD(d.pd, d.unknots);
}

/** <pd> times (-A^2 - A^-2)^unknots; the empty code with no unknots is taken as the empty link, 1. */
export function bracketOfPD(pd: PDCode, unknots = 0): Laurent {
  if (pd.length === 0) return loopFactor().pow(Math.max(unknots - 1, 0));
  let states = new Map<string, { match: number[]; poly: Dense }>([['', { match: [], poly: { off: 0, c: [1n] } }]]);
  let boundary: number[] = [];
  for (const x of contractionOrder(pd)) {
    const step = prepare(boundary, pd[x]);
    const next = new Map<string, { match: number[]; poly: Dense }>();
    for (const { match, poly } of states.values()) {
      for (const [smoothing, shift] of SMOOTHINGS) {
        const { match: q, loops } = join(step, match, smoothing);
        const key = q.join(',');
        const term = timesLoops({ off: poly.off + shift, c: poly.c }, loops);
        const old = next.get(key);
        if (old) old.poly = addDense(old.poly, term);
        else next.set(key, { match: q, poly: term });
      }
    }
    states = next;
    boundary = step.boundary;
  }
  const closed = states.get('')!.poly;
  // Every state has at least one loop; one of them is the normalising <O> = 1.
  const p = divideByLoop(closed);
  return Laurent.fromDense(p.c, p.off).mul(loopFactor().pow(unknots));
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
function contractionOrder(pd: PDCode): number[] {
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

function addDense(p: Dense, q: Dense): Dense {
  const off = Math.min(p.off, q.off);
  const c = new Array<bigint>(Math.max(p.off + p.c.length, q.off + q.c.length) - off).fill(0n);
  p.c.forEach((x, i) => (c[i + p.off - off] += x));
  q.c.forEach((x, i) => (c[i + q.off - off] += x));
  return { off, c };
}

// p * (-A^2 - A^-2)^loops
function timesLoops(p: Dense, loops: number): Dense {
  let { off, c } = p;
  for (let k = 0; k < loops; k++) {
    const r = new Array<bigint>(c.length + 4).fill(0n);
    c.forEach((x, i) => {
      r[i] -= x;
      r[i + 4] -= x;
    });
    off -= 2;
    c = r;
  }
  return { off, c };
}

// p / (-A^2 - A^-2) = -A^2 p / (1 + A^4); exact because every state closed at least one loop.
function divideByLoop(p: Dense): Dense {
  const c = p.c;
  const q = new Array<bigint>(Math.max(c.length - 4, 0)).fill(0n);
  for (let i = 0; i < q.length; i++) q[i] = c[i] - (i >= 4 ? q[i - 4] : 0n);
  return { off: p.off + 2, c: q.map((x) => -x) };
}
