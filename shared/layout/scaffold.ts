// A triangulated disk refining a connected PD diagram, so that Tutte's theorem applies (Tutte
// 1963, "How to draw a graph"; Floater 2003 for triangulated disks with a convex boundary).
// Each crossing becomes a square of four slot vertices with a centre (the crossing point),
// each edge gets a midpoint, and every face but the outer one gets a centre joined to its
// boundary. The truncated 4-valent map is cubic and bridgeless, hence 2-connected, so face
// boundaries are simple cycles and the refinement is a simple triangulation (loops/kinks and
// bigons included). Outer face: any face of the diagram, by default the largest.

import { PDCode, Slot, slotsOf } from '@/shared/knot/pd';

export interface Scaffold {
  readonly vertexCount: number;
  readonly edges: readonly (readonly [number, number])[];
  /** Triangles, all with the same orientation in a valid embedding. */
  readonly triangles: readonly (readonly [number, number, number])[];
  /** The outer face boundary, in order. */
  readonly outer: readonly number[];
  /** Faces of the diagram from largest to smallest (ties in order), to choose another outer face. */
  readonly bySize: readonly number[];
  /** Vertex of slot p of crossing x (x in the piece's own numbering). */
  slot(x: number, p: number): number;
  /** Vertex at the centre of crossing x: where the two strands cross. */
  centre(x: number): number;
  /** Vertex at the middle of the edge with this label. */
  midpoint(label: number): number;
  /** Edges between squares and their midpoints carry the strands; the rest is scaffolding. */
  readonly kind: readonly ('square' | 'strand' | 'centre' | 'face')[];
}

/** The boundary faces of the planar map: each a cycle of (leaving slot, label, arriving slot). */
function faces(pd: PDCode): { from: Slot; label: number; to: Slot }[][] {
  const slots = slotsOf(pd);
  const done = new Set<number>();
  const out: { from: Slot; label: number; to: Slot }[][] = [];
  pd.forEach((_, crossing) => {
    for (let position = 0; position < 4; position++) {
      const face: { from: Slot; label: number; to: Slot }[] = [];
      let from: Slot = { crossing, position };
      while (!done.has(from.crossing * 4 + from.position)) {
        done.add(from.crossing * 4 + from.position);
        const label = pd[from.crossing][from.position];
        const [s, t] = slots.get(label)!;
        const to = s.crossing === from.crossing && s.position === from.position ? t : s;
        face.push({ from, label, to });
        from = { crossing: to.crossing, position: (to.position + 1) % 4 };
      }
      if (face.length) out.push(face);
    }
  });
  return out;
}

/** The refinement with the `rank`-th largest face outside (0: the largest, the first of them). */
export function scaffold(pd: PDCode, rank = 0): Scaffold {
  const n = pd.length;
  const labels = [...new Set(pd.flat())];
  const midIndex = new Map(labels.map((l, i) => [l, 4 * n + n + i]));
  const slot = (x: number, p: number) => 4 * x + p;
  const centre = (x: number) => 4 * n + x;
  const midpoint = (label: number) => midIndex.get(label)!;
  let vertexCount = 5 * n + labels.length;

  const edges: [number, number][] = [];
  const kind: ('square' | 'strand' | 'centre' | 'face')[] = [];
  const triangles: [number, number, number][] = [];
  const edge = (a: number, b: number, k: (typeof kind)[number]) => {
    edges.push([a, b]);
    kind.push(k);
  };
  pd.forEach((x, i) => {
    for (let p = 0; p < 4; p++) {
      edge(slot(i, p), slot(i, (p + 1) % 4), 'square');
      edge(centre(i), slot(i, p), 'centre');
      edge(slot(i, p), midpoint(x[p]), 'strand');
      triangles.push([centre(i), slot(i, p), slot(i, (p + 1) % 4)]);
    }
  });

  const all = faces(pd).map((f) => f.flatMap(({ from, label, to }) => [slot(from.crossing, from.position), midpoint(label), slot(to.crossing, to.position)]));
  const bySize = all.map((_, i) => i).sort((i, j) => all[j].length - all[i].length || i - j);
  const outerIndex = bySize[rank % bySize.length];
  all.forEach((cycle, i) => {
    if (i === outerIndex) return;
    const c = vertexCount++;
    cycle.forEach((v, k) => {
      edge(c, v, 'face');
      // A face runs along a square edge in the same direction as the square's own triangle.
      triangles.push([c, cycle[(k + 1) % cycle.length], v]);
    });
  });
  return { vertexCount, edges, triangles, outer: all[outerIndex], bySize, slot, centre, midpoint, kind };
}
