// Connected summands of a PD code along its 2-edge cuts, found as the edges of equal label in a
// sampled cycle space (D. Pritchard and R. Thurimella, "Fast computation of small cuts via
// cycle space sampling", ACM Trans. Algorithms 7, 2011): every edge is labelled with the XOR of
// pseudo-random words of the cycles through it, and in a graph with no bridge two edges form a
// cut exactly when their labels agree (but for rare collisions, so a class is checked before it
// is used). Cutting the k edges of one class leaves k pieces in a ring, each a tangle with two
// ends; joining its ends closes each piece into a summand.

import { Crossing, PDCode, withLabelAt } from './pd';

/**
 * The code's summands along its largest class of 2-edge cuts, each with fewer crossings, or
 * undefined when there are no crossings, they are not connected or they have no such cut. The
 * normalised bracket of the code is the product of theirs: in every state each piece closes
 * its own loops, and the one loop through all the pieces is counted once (common practice).
 */
export function connectedSummands(pd: PDCode): PDCode[] | undefined {
  if (pd.length === 0) return undefined;
  const ends = new Map<number, [number, number][]>(); // label -> its two (crossing, position)
  pd.forEach((x, i) => x.forEach((label, p) => ends.set(label, [...(ends.get(label) ?? []), [i, p]])));
  const labels = cycleSpaceLabels(pd, ends);
  if (!labels) return undefined;
  const classes = new Map<number, number[]>();
  for (const [edge, w] of labels) if (w !== 0) classes.set(w, [...(classes.get(w) ?? []), edge]);
  const candidates = [...classes.values()].filter((c) => c.length >= 2).sort((p, q) => q.length - p.length);
  for (const cut of candidates) {
    const pieces = piecesApart(pd, ends, new Set(cut));
    if (pieces) return pieces;
  }
  return undefined;
}

/** A pseudo-random 32-bit word for each edge off the tree (a fixed hash, so results repeat). */
const word = (edge: number): number => {
  let h = Math.imul(edge ^ 0x9e3779b9, 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return (h ^ (h >>> 16)) | 1;
};

/**
 * Each edge's label: an edge off a spanning tree gets its own word, which is XORed onto the
 * tree path between its ends, so a tree edge gets the XOR of the words of the edges whose
 * cycles pass through it (the sum over its subtree). Undefined when the graph is not connected.
 */
function cycleSpaceLabels(pd: PDCode, ends: Map<number, [number, number][]>): Map<number, number> | undefined {
  const parentEdge = new Int32Array(pd.length).fill(-1);
  const seen = new Uint8Array(pd.length);
  const order: number[] = [0];
  seen[0] = 1;
  const treeEdges = new Set<number>();
  for (let k = 0; k < order.length; k++) {
    const i = order[k];
    for (const label of pd[i]) {
      const j = ends.get(label)!.find(([c]) => c !== i)?.[0];
      if (j === undefined || seen[j]) continue;
      seen[j] = 1;
      parentEdge[j] = label;
      treeEdges.add(label);
      order.push(j);
    }
  }
  if (order.length < pd.length) return undefined;
  const labels = new Map<number, number>();
  const sum = new Int32Array(pd.length);
  for (const [edge, [[a], [b]]] of ends) {
    if (treeEdges.has(edge)) continue;
    const w = word(edge);
    labels.set(edge, w);
    sum[a] ^= w;
    sum[b] ^= w;
  }
  // Children come after their parents in the breadth-first order: fold the sums upwards.
  for (let k = order.length - 1; k > 0; k--) {
    const i = order[k];
    const label = parentEdge[i];
    labels.set(label, sum[i]);
    const [[a], [b]] = ends.get(label)!;
    sum[a === i ? b : a] ^= sum[i];
  }
  return labels;
}

/**
 * The pieces left when the cut's edges are removed, each closed by giving its second loose end
 * the label of its first; undefined unless there are as many pieces as edges, two loose ends
 * each (a label collision, not a cut).
 */
function piecesApart(pd: PDCode, ends: Map<number, [number, number][]>, cut: Set<number>): PDCode[] | undefined {
  const piece = new Int32Array(pd.length).fill(-1);
  let count = 0;
  for (let start = 0; start < pd.length; start++) {
    if (piece[start] >= 0) continue;
    const stack = [start];
    piece[start] = count;
    while (stack.length > 0) {
      const i = stack.pop()!;
      for (const label of pd[i]) {
        if (cut.has(label)) continue;
        for (const [j] of ends.get(label)!) {
          if (piece[j] < 0) {
            piece[j] = count;
            stack.push(j);
          }
        }
      }
    }
    count++;
  }
  if (count !== cut.size) return undefined;
  const codes: Crossing[][] = Array.from({ length: count }, () => []);
  const index = Int32Array.from(piece, (c, i) => codes[c].push(pd[i]) - 1);
  const loose: [number, number, number][][] = Array.from({ length: count }, () => []); // piece -> (crossing in piece, position, label)
  for (const label of cut) for (const [i, p] of ends.get(label)!) loose[piece[i]].push([index[i], p, label]);
  if (loose.some((l) => l.length !== 2)) return undefined;
  loose.forEach(([[, , first], [at, p]], c) => (codes[c][at] = withLabelAt(codes[c][at], p, first)));
  return codes;
}
