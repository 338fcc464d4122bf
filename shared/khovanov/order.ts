// The order in which the local algorithm adds crossings. Bar-Natan's heuristic (math/0606318,
// Sect. 6) keeps the tangle's boundary small: greedily the crossing that closes the most open
// ends, tried from several first crossings. At a fixed boundary the simplified complex still
// grows with the crossings inside (measured: about 1.13 times per crossing on T(8,8), 1.2 on
// the (3,0)-cable of the figure-eight), so the late steps cost most and a wide cut is cheaper
// early than late. Orders are therefore scored by sum 2^cut * GROWTH^k over the steps k, and
// moved one crossing at a time to lower that (../knot/contraction-order.ts), starting from the
// greedy and the tree-decomposition order and from both reversed: a reversed order has the same
// cuts backwards, so a start's slow rise becomes a slow fall at the end.

import { contractionOrder, improveOrder, scoreOrder } from '../knot/contraction-order';
import { PDCode } from '../knot/pd';

/** Greedy order from `first`, ties to the lowest index, with its cost. */
function greedy(pd: PDCode, first: number): { order: number[]; cost: number } {
  const open = new Set<number>();
  const used = new Array<boolean>(pd.length).fill(false);
  const order: number[] = [];
  let cost = 0;
  const take = (k: number): void => {
    used[k] = true;
    order.push(k);
    for (const l of pd[k]) {
      if (open.has(l)) open.delete(l);
      else open.add(l);
    }
    cost += 2 ** open.size;
  };
  take(first);
  while (order.length < pd.length) {
    let best = -1;
    let bestScore = -1;
    pd.forEach((x, k) => {
      if (used[k]) return;
      const score = x.filter((l) => open.has(l)).length;
      if (score > bestScore) [best, bestScore] = [k, score];
    });
    take(best);
  }
  return { order, cost };
}

/** At most this many first crossings are tried (evenly spread), to keep large codes quick. */
const STARTS = 64;

/** The best greedy order, cost = sum of 2^cut over the steps. */
export function greedyOrder(pd: PDCode): { order: number[]; cost: number } {
  if (pd.length === 0) return { order: [], cost: 0 };
  const step = Math.max(1, Math.floor(pd.length / STARTS));
  let best = greedy(pd, 0);
  for (let first = step; first < pd.length; first += step) {
    const g = greedy(pd, first);
    if (g.cost < best.cost) best = g;
  }
  return best;
}

/** Per crossing placed, how much the complex grows at a fixed cut (a middle value of those measured). */
const GROWTH = 1.15;

/** The cheapest of the improved starts (`pd` closed: every label twice). */
export function crossingOrder(pd: PDCode): number[] {
  const starts = [greedyOrder(pd).order, contractionOrder(pd).order];
  const candidates = [...starts, ...starts.map((o) => [...o].reverse())].map((o) => improveOrder(pd, o, GROWTH));
  const costs = candidates.map((o) => scoreOrder(pd, o, GROWTH).cost);
  return candidates[costs.indexOf(Math.min(...costs))];
}
