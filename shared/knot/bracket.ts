// Kauffman bracket by tangle contraction along a tree decomposition: the bracket is computed
// over a tree (here path) decomposition of the diagram's graph in time exponential only in its
// width (J. A. Makowsky and J. P. Marino, "The parametrized complexity of knot polynomials",
// J. Comput. Syst. Sci. 67, 2003), the contracted region kept as a sum over crossingless
// matchings of its boundary, i.e. in the Temperley-Lieb / planar-algebra form of D. Bar-Natan,
// "Fast Khovanov homology computations", 2007, arXiv math/0606318. The order comes from
// contraction-order.ts (or a greedy sweep when that is cheaper), the matchings and their
// transitions from bracket-states.ts, the exact sums of their polynomials from bracket-sum.ts.
// A code that braid-closure.ts reads as a closed braid goes to bracket-braid.ts's sweep instead,
// and a wide one that summands.ts splits into connected summands is the product of theirs.

import { Diagram } from './diagram';
import { Laurent } from '@/shared/poly/laurent';
import { PDCode } from './pd';
import { contractionOrder, OrderScore, scoreOrder } from './contraction-order';
import { stateGraph } from './bracket-states';
import { closedSum, Strided } from './bracket-sum';
import { braidClosure, ClosedBraid } from './braid-closure';
import { braidSweepFits, sweepBracket } from './bracket-braid';
import { connectedSummands } from './summands';

/** The Kauffman bracket <D> in A, normalised so that <O> = 1 (docs/conventions.md). */
export function bracket(d: Diagram): Laurent {
  return bracketOfPD(d.pd, d.unknots);
}

/**
 * <pd> times (-A^2 - A^-2)^unknots; the empty code with no unknots is taken as the empty link, 1.
 * Any code with every label twice will do (planarity only speeds it up); a RangeError if the
 * order's cut exceeds 256 ends, far beyond what a contraction can finish anyway.
 */
export function bracketOfPD(pd: PDCode, unknots = 0): Laurent {
  if (pd.length === 0) return loopFactor().pow(Math.max(unknots - 1, 0));
  const greedy = greedyOrder(pd);
  const score = scoreOrder(pd, greedy);
  const braid = sweepable(pd, score.widest);
  const summands = braid || score.widest <= NARROW ? undefined : connectedSummands(pd);
  const closed = braid
    ? sweepBracket(braid.word, braid.strands)
    : summands
      ? summands.reduce((product, s) => product.mul(bracketOfPD(s)), Laurent.one)
      : contracted(pd, cheaperOrder(pd, greedy, score));
  return closed.mul(loopFactor().pow(unknots));
}

/** bracketOfPD by the tangle contraction alone, never the braid sweep (a reference for the sweep). */
export function bracketByContraction(pd: PDCode, unknots = 0): Laurent {
  if (pd.length === 0) return bracketOfPD(pd, unknots);
  return contracted(pd, cheaperOrder(pd)).mul(loopFactor().pow(unknots));
}

/** <pd> by contracting the crossings in this order. */
function contracted(pd: PDCode, order: number[]): Laurent {
  const graph = stateGraph(pd, order);
  const closed = dense(graph.stride, closedSum(graph));
  // Every state has at least one loop; one of them is the normalising <O> = 1.
  const p = divideByLoop(closed);
  return Laurent.fromDense(p.c, p.off);
}

/**
 * The braid whose closure the code is, when the Temperley-Lieb sweep suits it by bracketOfBraid's
 * rule: its buffers fit and the greedy order's widest cut reaches 2 ends per strand (so under 4
 * ends no braid is looked for).
 */
function sweepable(pd: PDCode, widest: number): ClosedBraid | undefined {
  const braid = widest >= 4 ? braidClosure(pd, Math.floor(widest / 2)) : undefined;
  return braid && braidSweepFits(braid.strands, braid.word.length) ? braid : undefined;
}

/** Up to this cut the greedy order is cheap enough that a search for a better one does not pay. */
const NARROW = 10;

/** The greedy order below (scored) or the tree-decomposition order, whichever costs less. */
function cheaperOrder(pd: PDCode, greedy = greedyOrder(pd), score: OrderScore = scoreOrder(pd, greedy)): number[] {
  if (score.widest <= NARROW) return greedy;
  const tree = contractionOrder(pd);
  return tree.cost < score.cost ? tree.order : greedy;
}

/** A dense polynomial in A: sum of c[i] A^(off + i). */
export interface Dense {
  off: number;
  c: bigint[];
}

/** The closed sum, its exponents stride apart, written densely. */
function dense(stride: number, p: Strided): Dense {
  const c = new Array<bigint>(stride * (p.c.length - 1) + 1).fill(0n);
  p.c.forEach((x, i) => (c[stride * i] = x));
  return { off: p.off, c };
}

/** -A^2 - A^-2, the value of a circle. */
export const loopFactor = (): Laurent => Laurent.fromPairs([[2, -1], [-2, -1]]);

// Greedy order: next the crossing with most edges on the current boundary, which keeps the cut
// small; among those, the one touching the longest-open edge, so the cut sweeps the diagram.
export function greedyOrder(pd: PDCode): number[] {
  const left = new Set(pd.map((_, i) => i));
  const opened = new Map<number, number>(); // boundary label -> step at which it opened
  const closed = new Set<number>();
  const order: number[] = [];
  while (left.size > 0) {
    let best = -1;
    let bestScore = -Infinity;
    for (const i of left) {
      let shared = 0;
      let oldest = pd.length;
      for (const l of pd[i]) {
        const at = opened.get(l);
        if (at === undefined) continue;
        shared++;
        oldest = Math.min(oldest, at);
      }
      const score = shared * (pd.length + 1) - oldest;
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
export function divideByLoop(p: Dense): Dense {
  const c = p.c;
  const q = new Array<bigint>(Math.max(c.length - 4, 0)).fill(0n);
  for (let i = 0; i < q.length; i++) q[i] = c[i] - (i >= 4 ? q[i - 4] : 0n);
  return { off: p.off + 2, c: q.map((x) => -x) };
}
