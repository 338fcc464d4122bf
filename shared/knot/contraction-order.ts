// A crossing order for tangle contraction from a tree decomposition of the diagram's graph
// (crossings are vertices, PD labels edges): a min-fill elimination ordering gives the
// decomposition (H. L. Bodlaender and A. M. C. A. Koster, "Treewidth computations I. Upper
// bounds", Information and Computation 208, 2010), a post-order walk of its elimination tree
// gives the order, and single-crossing moves then lower its cost. The cut after a prefix of the
// order is the number of open ends of the tangle those crossings form; a contraction's work
// grows about like 2^cut, so an order is scored by its cost, the sum of 2^cut over the steps.

import { PDCode } from './pd';

export interface OrderScore {
  /** The widest cut over the steps (0 for the empty code). */
  widest: number;
  /** Sum over the steps of 2^cut, an estimate of the work of a contraction in this order. */
  cost: number;
}

export interface ContractionOrder extends OrderScore {
  /** Every crossing index once. */
  order: number[];
}

/** The cut after each step: cuts[k] open ends once order[0..k] are placed. */
export function cutWidths(pd: PDCode, order: readonly number[]): number[] {
  const open = new Set<number>();
  return order.map((k) => {
    for (const l of pd[k]) {
      if (open.has(l)) open.delete(l);
      else open.add(l);
    }
    return open.size;
  });
}

/** Widest cut and cost of any order, so a caller can compare its own order with ours. */
export function scoreOrder(pd: PDCode, order: readonly number[]): OrderScore {
  const cuts = cutWidths(pd, order);
  return { widest: Math.max(0, ...cuts), cost: cuts.reduce((s, w) => s + weight(w), 0) };
}

/** 2^cut, capped where a double would overflow (such a cut is far beyond any contraction). */
const weight = (cut: number): number => 2 ** Math.min(cut, 1000);

/**
 * An order of the crossings of `pd` (any code in which every label occurs twice; planarity is
 * not needed) with its widest cut and cost. Pure and deterministic; the empty code gives [].
 */
export function contractionOrder(pd: PDCode): ContractionOrder {
  const graph = crossingGraph(pd);
  const tree = postOrder(eliminationTree(graph));
  const cheaper = [tree, sweep(graph, tree)].map((o) => ({ o, cost: scoreOrder(pd, o).cost })).reduce((a, b) => (b.cost < a.cost ? b : a));
  const order = improve(graph, cheaper.o);
  return { order, ...scoreOrder(pd, order) };
}

/** Edge multiplicities between crossings (kinks, a label twice at one crossing, are left out). */
interface Graph {
  /** For every crossing, its neighbours with the number of labels shared. */
  edges: Map<number, number>[];
  /** Ends of the crossing that lead to other crossings (4 minus twice its kinks). */
  degree: number[];
}

function crossingGraph(pd: PDCode): Graph {
  const ends = new Map<number, number[]>();
  pd.forEach((x, k) => x.forEach((l) => ends.set(l, [...(ends.get(l) ?? []), k])));
  const edges = pd.map(() => new Map<number, number>());
  const degree = pd.map(() => 0);
  for (const [a, b] of ends.values()) {
    if (a === b) continue;
    edges[a].set(b, (edges[a].get(b) ?? 0) + 1);
    edges[b].set(a, (edges[b].get(a) ?? 0) + 1);
    degree[a]++;
    degree[b]++;
  }
  return { edges, degree };
}

/** A min-fill elimination ordering and the parent of every crossing in its elimination tree (-1 for a root). */
function eliminationTree(graph: Graph): { eliminated: number[]; parent: number[] } {
  const n = graph.edges.length;
  const nb = graph.edges.map((e) => new Set(e.keys()));
  const fill = new Array<number>(n).fill(0);
  const stale = new Array<boolean>(n).fill(true);
  const done = new Array<boolean>(n).fill(false);
  const eliminated: number[] = [];
  const parent = new Array<number>(n).fill(-1);
  const laterNeighbours: number[][] = [];
  const position = new Array<number>(n);
  const fillOf = (v: number): number => {
    const list = [...nb[v]];
    let missing = 0;
    for (let i = 0; i < list.length; i++) for (let j = i + 1; j < list.length; j++) if (!nb[list[i]].has(list[j])) missing++;
    return missing;
  };
  for (let step = 0; step < n; step++) {
    let best = -1;
    for (let v = 0; v < n; v++) {
      if (done[v]) continue;
      if (stale[v]) [fill[v], stale[v]] = [fillOf(v), false];
      if (best < 0 || fill[v] < fill[best] || (fill[v] === fill[best] && nb[v].size < nb[best].size)) best = v;
    }
    const later = [...nb[best]];
    done[best] = true;
    eliminated.push(best);
    position[best] = step;
    laterNeighbours[best] = later;
    for (const u of later) {
      nb[u].delete(best);
      for (const w of later) if (w !== u) nb[u].add(w);
    }
    // Fill changes only where a neighbourhood, or the edges inside one, changed.
    for (const u of later) {
      stale[u] = true;
      for (const w of nb[u]) stale[w] = true;
    }
  }
  for (let v = 0; v < n; v++) {
    for (const u of laterNeighbours[v]) if (parent[v] < 0 || position[u] < position[parent[v]]) parent[v] = u;
  }
  return { eliminated, parent };
}

/**
 * Children before parents, each subtree finished before the next begins: the placed crossings
 * are always whole subtrees and a path, and a subtree's open ends lead only to its ancestors
 * (the property of an elimination tree), so the cut stays near the decomposition's width.
 * Smaller subtrees go first, so few finished ones wait for their parent at once.
 */
function postOrder({ eliminated, parent }: { eliminated: number[]; parent: number[] }): number[] {
  const children = parent.map(() => [] as number[]);
  const size = parent.map(() => 1);
  // Children are eliminated before their parents: one sweep sums the subtree sizes.
  for (const v of eliminated) if (parent[v] >= 0) size[parent[v]] += size[v];
  parent.forEach((p, v) => p >= 0 && children[p].push(v));
  const bySize = (a: number, b: number) => size[a] - size[b] || a - b;
  const order: number[] = [];
  // Iterative walk (an elimination tree can be a path as long as the code).
  const stack: [number, number][] = eliminated.filter((v) => parent[v] < 0).sort(bySize).reverse().map((v) => [v, 0]);
  children.forEach((c) => c.sort(bySize));
  while (stack.length > 0) {
    const top = stack[stack.length - 1];
    const [v, next] = top;
    if (next < children[v].length) {
      top[1]++;
      stack.push([children[v][next], 0]);
    } else {
      stack.pop();
      order.push(v);
    }
  }
  return order;
}

/**
 * A sweep guided by the decomposition: next the crossing with most ends on the placed ones,
 * ties to the one the tree order places first (so the sweep starts at a leaf and follows the
 * tree where the cut does not decide).
 */
function sweep(graph: Graph, tree: number[]): number[] {
  const n = tree.length;
  const rank = new Array<number>(n);
  tree.forEach((v, i) => (rank[v] = i));
  const toPlaced = new Array<number>(n).fill(0);
  const placed = new Array<boolean>(n).fill(false);
  const order: number[] = [];
  for (let step = 0; step < n; step++) {
    let best = -1;
    for (let v = 0; v < n; v++) {
      if (placed[v]) continue;
      if (best < 0 || toPlaced[v] > toPlaced[best] || (toPlaced[v] === toPlaced[best] && rank[v] < rank[best])) best = v;
    }
    placed[best] = true;
    order.push(best);
    for (const [u, m] of graph.edges[best]) toPlaced[u] += m;
  }
  return order;
}

/** At most this many improvement passes (each O(n^2)), which is where the gains stop in practice. */
const PASSES = 4;

/**
 * Local search: every crossing in turn moves to the place in the order that lowers the cost
 * most (if any). Removing crossing x from a placed set P changes its cut by 2 e(x, P) - deg x,
 * adding it by deg x - 2 e(x, P), so each candidate place costs O(1) while scanning.
 */
function improve(graph: Graph, start: number[]): number[] {
  const n = start.length;
  const pow = Array.from({ length: 4 * n + 5 }, (_, w) => weight(w));
  let order = start;
  let cuts = prefixCuts(graph, order);
  for (let pass = 0; pass < PASSES; pass++) {
    let moved = false;
    for (const x of [...order]) {
      const i = order.indexOf(x);
      const d = graph.degree[x];
      const e = graph.edges[x];
      let bestDelta = -0.5; // costs are whole numbers: a smaller gain is rounding
      let bestJ = i;
      // Later: prefixes L = i+1..j lose x; cuts[L] is the cut after L crossings.
      let delta = 0;
      let toPlaced = 0; // e(x, crossings of order[0..L-1] other than x)
      for (let k = 0; k < i; k++) toPlaced += e.get(order[k]) ?? 0;
      const before = toPlaced;
      for (let j = i + 1; j < n; j++) {
        toPlaced += e.get(order[j]) ?? 0;
        delta += pow[cuts[j + 1] + 2 * toPlaced - d] - pow[cuts[j]];
        if (delta < bestDelta) [bestDelta, bestJ] = [delta, j];
      }
      // Earlier: prefixes L = j+1..i gain x (x then sits at index j).
      delta = 0;
      toPlaced = before;
      for (let j = i - 1; j >= 0; j--) {
        toPlaced -= e.get(order[j]) ?? 0; // now e(x, order[0..j-1])
        delta += pow[cuts[j] + d - 2 * toPlaced] - pow[cuts[j + 1]];
        if (delta < bestDelta) [bestDelta, bestJ] = [delta, j];
      }
      if (bestJ !== i) {
        order = [...order];
        order.splice(i, 1);
        order.splice(bestJ, 0, x);
        cuts = prefixCuts(graph, order);
        moved = true;
      }
    }
    if (!moved) break;
  }
  return order;
}

/** cuts[L]: open ends after the first L crossings (cuts[0] = 0), from the graph alone. */
function prefixCuts(graph: Graph, order: readonly number[]): number[] {
  const placed = new Set<number>();
  const cuts = [0];
  for (const x of order) {
    let toPlaced = 0;
    for (const [y, m] of graph.edges[x]) if (placed.has(y)) toPlaced += m;
    placed.add(x);
    cuts.push(cuts[cuts.length - 1] + graph.degree[x] - 2 * toPlaced);
  }
  return cuts;
}
