// Force-directed relaxation of a triangulated disk (springs and vertex repulsion in the manner
// of Fruchterman and Reingold 1991, "Graph drawing by force-directed placement"), with every
// move guarded: a vertex moves only if all its triangles keep their orientation, so the
// embedding stays planar (a triangulated disk with a fixed convex boundary and consistently
// oriented triangles is embedded; Floater 2003). The boundary stays where it is.

import { Point } from '@/shared/drawing/point';

export interface Spring {
  readonly a: number;
  readonly b: number;
  /** Rest length as a multiple of the mean spacing. */
  readonly rest: number;
  readonly weight: number;
}

export interface RelaxInput {
  readonly positions: readonly Point[];
  /** Springs along the edges, and any others (e.g. ones that straighten strands). */
  readonly springs: readonly Spring[];
  readonly triangles: readonly (readonly [number, number, number])[];
  readonly fixed: ReadonlySet<number>;
  readonly iterations: number;
}

const area = (a: Point, b: Point, c: Point) => (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);

export function relax(input: RelaxInput): Point[] {
  const pos = input.positions.map((p) => ({ x: p.x, y: p.y }));
  const n = pos.length;
  const spacing = Math.sqrt(Math.abs(input.triangles.reduce((s, [a, b, c]) => s + area(pos[a], pos[b], pos[c]), 0)) / input.triangles.length);
  const sign = Math.sign(area(pos[input.triangles[0][0]], pos[input.triangles[0][1]], pos[input.triangles[0][2]]));
  const minArea = 1e-3 * spacing * spacing;
  const springs: { u: number; rest: number; weight: number }[][] = Array.from({ length: n }, () => []);
  for (const { a, b, rest, weight } of input.springs) {
    springs[a].push({ u: b, rest: rest * spacing, weight });
    springs[b].push({ u: a, rest: rest * spacing, weight });
  }
  const around: (readonly [number, number, number])[][] = Array.from({ length: n }, () => []);
  for (const t of input.triangles) for (const v of t) around[v].push(t);
  const areas = (v: number) => around[v].map(([a, b, c]) => sign * area(pos[a], pos[b], pos[c]));
  // A move may not flip a triangle, nor squeeze it below minArea (or below half its area if
  // it is already that thin).
  const valid = (after: number[], before: number[]) => after.every((x, i) => x > Math.min(minArea, before[i] / 2));

  for (let it = 0; it < input.iterations; it++) {
    const heat = 0.25 * spacing * (1 - it / input.iterations) + 0.02 * spacing;
    for (let v = 0; v < n; v++) {
      if (input.fixed.has(v)) continue;
      let fx = 0;
      let fy = 0;
      for (const { u, rest, weight } of springs[v]) {
        const dx = pos[u].x - pos[v].x;
        const dy = pos[u].y - pos[v].y;
        const len = Math.hypot(dx, dy) || 1e-12;
        fx += (dx / len) * (len - rest) * weight;
        fy += (dy / len) * (len - rest) * weight;
      }
      for (let u = 0; u < n; u++) {
        if (u === v) continue;
        const dx = pos[v].x - pos[u].x;
        const dy = pos[v].y - pos[u].y;
        const len2 = dx * dx + dy * dy;
        if (len2 > 4 * spacing * spacing) continue;
        const k = (spacing * spacing) / Math.max(len2, 1e-12);
        fx += dx * k * 0.2;
        fy += dy * k * 0.2;
      }
      const f = Math.hypot(fx, fy);
      if (f === 0) continue;
      // Steps are also bounded by the vertex's own neighbourhood, so that a squeezed region
      // (Tutte embeddings shrink some regions exponentially) can still move and grow.
      const local = Math.min(...around[v].map(([a, b, c]) => Math.min(Math.hypot(pos[a].x - pos[b].x, pos[a].y - pos[b].y), Math.hypot(pos[b].x - pos[c].x, pos[b].y - pos[c].y), Math.hypot(pos[c].x - pos[a].x, pos[c].y - pos[a].y))));
      const step = Math.min(f, heat, 0.3 * local) / f;
      const old = pos[v];
      const before = areas(v);
      for (let k = step; k > step / 8; k /= 2) {
        pos[v] = { x: old.x + fx * k, y: old.y + fy * k };
        if (valid(areas(v), before)) break;
        pos[v] = old;
      }
    }
  }
  return pos;
}
