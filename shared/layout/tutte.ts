// Tutte's barycentric embedding (Tutte 1963, "How to draw a graph"): the boundary is fixed on a
// convex polygon and every other vertex sits at the average of its neighbours. The linear
// system (a graph Laplacian, symmetric positive definite on the free vertices) is solved by
// conjugate gradients (Hestenes and Stiefel 1952).

import { Point } from '@/shared/drawing/point';

export function tutte(vertexCount: number, edges: readonly (readonly [number, number])[], fixed: ReadonlyMap<number, Point>): Point[] {
  const neighbours: number[][] = Array.from({ length: vertexCount }, () => []);
  for (const [a, b] of edges) {
    neighbours[a].push(b);
    neighbours[b].push(a);
  }
  const free = [...Array(vertexCount).keys()].filter((v) => !fixed.has(v));
  const index = new Map(free.map((v, i) => [v, i]));
  // L x = rhs restricted to the free vertices.
  const apply = (x: Float64Array): Float64Array => {
    const out = new Float64Array(free.length);
    free.forEach((v, i) => {
      let s = neighbours[v].length * x[i];
      for (const u of neighbours[v]) {
        const j = index.get(u);
        if (j !== undefined) s -= x[j];
      }
      out[i] = s;
    });
    return out;
  };
  const solve = (coord: (p: Point) => number): Float64Array => {
    const b = new Float64Array(free.length);
    free.forEach((v, i) => {
      for (const u of neighbours[v]) if (fixed.has(u)) b[i] += coord(fixed.get(u)!);
    });
    const x = new Float64Array(free.length);
    const r = Float64Array.from(b);
    const p = Float64Array.from(b);
    let rr = r.reduce((s, v) => s + v * v, 0);
    for (let it = 0; it < 10 * free.length + 50 && rr > 1e-24; it++) {
      const ap = apply(p);
      const alpha = rr / p.reduce((s, v, i) => s + v * ap[i], 0);
      for (let i = 0; i < x.length; i++) {
        x[i] += alpha * p[i];
        r[i] -= alpha * ap[i];
      }
      const next = r.reduce((s, v) => s + v * v, 0);
      for (let i = 0; i < p.length; i++) p[i] = r[i] + (next / rr) * p[i];
      rr = next;
    }
    return x;
  };
  const xs = solve((p) => p.x);
  const ys = solve((p) => p.y);
  return [...Array(vertexCount).keys()].map((v) => fixed.get(v) ?? { x: xs[index.get(v)!], y: ys[index.get(v)!] });
}
