// The Kauffman bracket as the plain state sum over all 2^n smoothings (Kauffman, "State models
// and the Jones polynomial", Topology 26, 1987). Exponential: a reference for tests only.

import { Diagram } from './diagram';
import { Laurent } from '@/shared/poly/laurent';
import { loopFactor } from './bracket';

export function stateSumBracket(d: Diagram): Laurent {
  const n = d.pd.length;
  if (n === 0) return loopFactor().pow(Math.max(d.unknots - 1, 0));
  if (n > 24) throw new RangeError(`the state sum over 2^${n} states is too large`);
  const labels = [...new Set(d.pd.flat())];
  const index = new Map(labels.map((l, i) => [l, i]));
  const counts = new Map<string, number>(); // "aMinusB,loops" -> number of states
  const parent = new Array<number>(labels.length);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i])));
  for (let state = 0; state < 2 ** n; state++) {
    for (let i = 0; i < parent.length; i++) parent[i] = i;
    let aMinusB = 0;
    d.pd.forEach((x, k) => {
      const [a, b, c, e] = x.map((l) => index.get(l)!);
      if ((state >> k) & 1) {
        aMinusB--;
        parent[find(a)] = find(e);
        parent[find(b)] = find(c);
      } else {
        aMinusB++;
        parent[find(a)] = find(b);
        parent[find(c)] = find(e);
      }
    });
    const loops = parent.filter((_, i) => find(i) === i).length;
    const key = `${aMinusB},${loops}`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  let sum = Laurent.zero;
  for (const [key, count] of counts) {
    const [aMinusB, loops] = key.split(',').map(Number);
    sum = sum.add(loopFactor().pow(loops - 1).shift(aMinusB).scale(count));
  }
  return sum.mul(loopFactor().pow(d.unknots));
}
