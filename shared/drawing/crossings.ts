// Crossings and degeneracies of closed polylines. Method: a grid broad phase gives the pairs of
// segments closer than the tolerance; such pairs that touch along both strands form clusters
// (union-find). A cluster with exactly one proper segment intersection is a crossing, unless the
// strands run side by side through it (a retrace, retrace.ts); a cluster with none is a
// tangency/near-touch (or a retraced stroke), one with several is an ambiguous tangle. Crossings
// closer together than minCrossingGap (e.g. three strands through one point) are reported too.
// Any marker means the drawing has no reliable diagram.

import { DrawingOptions } from './options';
import { lerp, Point, sub } from './point';
import { isRetrace } from './retrace';
import { intersect, nearbyPairs, Segment, segmentDistance } from './segments';

export interface Path {
  readonly id: string;
  readonly points: readonly Point[];
}

/** One strand's pass through a crossing. */
export interface Passage {
  /** Index into the analysed paths. */
  readonly path: number;
  readonly segment: number;
  /** Arc length from the path's first point, in drawing order. */
  readonly arc: number;
  /** Direction of the segment in drawing order. */
  readonly direction: Point;
}

export interface FoundCrossing {
  readonly at: Point;
  /** The two passages; for a self-crossing the earlier-drawn one first. */
  readonly passages: readonly [Passage, Passage];
}

export type MarkerKind = 'touch' | 'overlap' | 'retrace' | 'tangle' | 'crowded' | 'triple-point';

export interface Marker {
  readonly kind: MarkerKind;
  readonly at: Point;
  readonly message: string;
  /** Ids of the components involved. */
  readonly components: readonly string[];
}

const messages: Record<MarkerKind, string> = {
  touch: 'The strands touch here without crossing clearly: move them apart or make them cross.',
  overlap: 'A strand runs along a strand here (a retraced stroke): redraw this piece.',
  retrace: 'A strand runs close along a strand through a crossing too shallow to see (traced twice?): redraw it once round, or make the crossing clear.',
  tangle: 'The strands cross several times in a tiny area here: draw the crossings farther apart.',
  crowded: 'Two crossings are too close together here: spread them out.',
  'triple-point': 'Three strands pass through nearly one point here: move one of them.',
};

interface Seg extends Segment {
  readonly path: number;
  readonly index: number;
  readonly arc: number;
}

function segmentsOf(paths: readonly Path[]): { segs: Seg[]; offsets: number[] } {
  const segs: Seg[] = [];
  const offsets: number[] = [];
  paths.forEach((path, k) => {
    offsets.push(segs.length);
    let arc = 0;
    const n = path.points.length;
    for (let i = 0; i < n; i++) {
      const p = path.points[i];
      const q = path.points[(i + 1) % n];
      segs.push({ p, q, path: k, index: i, arc });
      arc += Math.hypot(q.x - p.x, q.y - p.y);
    }
  });
  return { segs, offsets };
}

class UnionFind {
  private readonly parent: number[] = [];
  add(): number {
    this.parent.push(this.parent.length);
    return this.parent.length - 1;
  }
  find(i: number): number {
    while (this.parent[i] !== i) i = this.parent[i] = this.parent[this.parent[i]];
    return i;
  }
  union(i: number, j: number): void {
    this.parent[this.find(i)] = this.find(j);
  }
}

interface ClosePair {
  readonly g: number;
  readonly h: number;
  readonly distance: number;
  readonly hit: { t: number; u: number } | null;
}

export function findCrossings(paths: readonly Path[], o: DrawingOptions): { crossings: FoundCrossing[]; markers: Marker[] } {
  const { segs, offsets } = segmentsOf(paths);
  const count = (k: number) => paths[k].points.length;
  // Segments of one path closer than this along the path are neighbours, not a near-touch.
  const skipSteps = (k: number) => {
    const step = segs.length ? (segs[offsets[k] + count(k) - 1].arc + 1e-9) / count(k) : 1;
    return Math.ceil((2 * o.tolerance) / step) + 1;
  };
  const skip = paths.map((_, k) => skipSteps(k));
  const neighbours = (g: number): number[] => {
    const s = segs[g];
    const n = count(s.path);
    return [g, offsets[s.path] + ((s.index + 1) % n), offsets[s.path] + ((s.index + n - 1) % n)];
  };

  const close: ClosePair[] = [];
  const keyOf = new Map<number, number>();
  const total = segs.length;
  for (const [g, h] of nearbyPairs(segs, o.tolerance, 2 * Math.max(o.tolerance, o.spacing))) {
    const a = segs[g];
    const b = segs[h];
    if (a.path === b.path) {
      const gap = Math.abs(a.index - b.index);
      if (Math.min(gap, count(a.path) - gap) <= skip[a.path]) continue;
    }
    const distance = segmentDistance(a, b);
    if (distance >= o.tolerance) continue;
    keyOf.set(g * total + h, close.length);
    close.push({ g, h, distance, hit: intersect(a, b) });
  }

  const uf = new UnionFind();
  close.forEach(() => uf.add());
  close.forEach((c, i) => {
    for (const g of neighbours(c.g)) {
      for (const h of neighbours(c.h)) {
        const j = keyOf.get(Math.min(g, h) * total + Math.max(g, h));
        if (j !== undefined) uf.union(i, j);
      }
    }
  });
  const clusters = new Map<number, ClosePair[]>();
  close.forEach((c, i) => {
    const root = uf.find(i);
    const list = clusters.get(root);
    if (list) list.push(c);
    else clusters.set(root, [c]);
  });

  const crossings: FoundCrossing[] = [];
  const markers: Marker[] = [];
  const ids = (c: ClosePair) => [...new Set([paths[segs[c.g].path].id, paths[segs[c.h].path].id])];
  const mark = (kind: MarkerKind, at: Point, components: readonly string[]) => markers.push({ kind, at, message: messages[kind], components });

  for (const cluster of clusters.values()) {
    const hits = cluster.filter((c) => c.hit);
    if (hits.length === 1) {
      const found = crossingOf(segs, hits[0]);
      if (isRetrace(paths, found.passages, o)) mark('retrace', found.at, ids(hits[0]));
      else crossings.push(found);
      continue;
    }
    const nearest = cluster.reduce((m, c) => (c.distance < m.distance ? c : m));
    const at = lerp(lerp(segs[nearest.g].p, segs[nearest.g].q, 0.5), lerp(segs[nearest.h].p, segs[nearest.h].q, 0.5), 0.5);
    if (hits.length > 1) mark('tangle', at, ids(nearest));
    else {
      const along = new Set(cluster.map((c) => c.g)).size * o.spacing;
      mark(along > 10 * o.tolerance ? 'overlap' : 'touch', at, ids(nearest));
    }
  }

  for (let i = 0; i < crossings.length; i++) {
    for (let j = i + 1; j < crossings.length; j++) {
      const d = Math.hypot(crossings[i].at.x - crossings[j].at.x, crossings[i].at.y - crossings[j].at.y);
      if (d >= o.minCrossingGap) continue;
      const involved = [...crossings[i].passages, ...crossings[j].passages].map((p) => paths[p.path].id);
      mark(d < 2 * o.tolerance ? 'triple-point' : 'crowded', lerp(crossings[i].at, crossings[j].at, 0.5), [...new Set(involved)]);
    }
  }
  return { crossings, markers };
}

function crossingOf(segs: readonly Seg[], c: ClosePair): FoundCrossing {
  const a = segs[c.g];
  const b = segs[c.h];
  const { t, u } = c.hit!;
  const passage = (s: Seg, along: number): Passage => ({
    path: s.path,
    segment: s.index,
    arc: s.arc + along * Math.hypot(s.q.x - s.p.x, s.q.y - s.p.y),
    direction: sub(s.q, s.p),
  });
  // g < h: same path means a is earlier along the path; different paths keep path order.
  return { at: lerp(a.p, a.q, t), passages: [passage(a, t), passage(b, u)] };
}
