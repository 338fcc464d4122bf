// The order in which the local algorithm adds crossings: greedily the crossing that closes the
// most open ends, so the tangle's boundary (and with it the complex) stays small (the heuristic
// of Bar-Natan, math/0606318, Sect. 6). Ties go to the lowest index; `first` starts the order.

import { PDCode } from '../knot/pd';

export function crossingOrder(pd: PDCode, first = 0): number[] {
  const open = new Set<number>();
  const used = new Array<boolean>(pd.length).fill(false);
  const order: number[] = [];
  const take = (k: number): void => {
    used[k] = true;
    order.push(k);
    for (const l of pd[k]) {
      if (open.has(l)) open.delete(l);
      else open.add(l);
    }
  };
  if (pd.length > 0) take(first);
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
  return order;
}
