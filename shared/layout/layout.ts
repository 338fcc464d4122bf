// A clean planar picture of any PD code: each connected piece is refined to a triangulated
// disk (scaffold.ts), embedded by Tutte's method with its largest face outside, relaxed by a
// planarity-preserving force model, and its strands are drawn through the crossing centres,
// slot vertices and edge midpoints, then rounded by Chaikin corner cutting. Pieces are set
// side by side, crossingless unknots as circles after them. Coordinates are on screen (y down)
// and the counterclockwise order of every PD crossing is counterclockwise as seen.

import { chaikin } from '@/shared/drawing/smooth';
import { Point } from '@/shared/drawing/point';
import { connectedPieces, orient, PDCode } from '@/shared/knot/pd';
import { relax } from './relax';
import { scaffold } from './scaffold';
import { tutte } from './tutte';

export interface LayoutPassage {
  readonly component: number;
  /** Where along the component's path the passage lies, as a fraction of its length. */
  readonly fraction: number;
}

export interface LayoutCrossing {
  readonly at: Point;
  readonly over: LayoutPassage;
  readonly under: LayoutPassage;
}

export interface LinkLayout {
  /** Closed paths in order of travel: orient()'s components, then the unknots. */
  readonly paths: readonly (readonly Point[])[];
  /** PD crossing i is crossings[i]. */
  readonly crossings: readonly LayoutCrossing[];
}

export interface LayoutOptions {
  /** Mean distance between neighbouring vertices of the refinement, in pixels. */
  readonly spacing?: number;
  readonly iterations?: number;
  /** Chaikin rounds for the strands (0 = the raw polyline through the refinement). */
  readonly rounds?: number;
}

const restOf = { square: 0.7, centre: 0.5, strand: 1, face: 1.2 };

/** Vertex positions of one connected piece (its crossings renumbered 0..k-1), unit scale. */
function embedPiece(pd: PDCode, iterations: number) {
  const sc = scaffold(pd);
  const m = sc.outer.length;
  const fixed = new Map(sc.outer.map((v, k) => [v, { x: Math.cos((2 * Math.PI * k) / m), y: Math.sin((2 * Math.PI * k) / m) }]));
  const start = tutte(sc.vertexCount, sc.edges, fixed);
  let pos = relax({
    positions: start,
    edges: sc.edges,
    rest: sc.kind.map((k) => restOf[k]),
    triangles: sc.triangles,
    fixed: new Set(sc.outer),
    iterations,
  });
  // Seen on screen, slots 0, 1, 2 of a crossing must turn counterclockwise (y down: cross < 0).
  const [a, b, c] = [0, 1, 2].map((p) => pos[sc.slot(0, p)]);
  if ((b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x) > 0) pos = pos.map((p) => ({ x: p.x, y: -p.y }));
  return { sc, pos };
}

const cumulative = (pts: readonly Point[]): number[] => {
  const out = [0];
  for (let i = 1; i <= pts.length; i++) out.push(out[i - 1] + Math.hypot(pts[i % pts.length].x - pts[i - 1].x, pts[i % pts.length].y - pts[i - 1].y));
  return out;
};

export function layoutPD(pd: PDCode, unknots = 0, options: LayoutOptions = {}): LinkLayout {
  const spacing = options.spacing ?? 24;
  const rounds = options.rounds ?? 2;
  const o = orient(pd);
  const pieces = connectedPieces(pd);
  const where = new Map<number, { piece: number; local: number }>();
  pieces.forEach((crossings, piece) => crossings.forEach((x, local) => where.set(x, { piece, local })));

  // Place every piece at pixel scale, side by side.
  let offset = 0;
  const placed = pieces.map((crossings) => {
    const { sc, pos } = embedPiece(crossings.map((x) => pd[x]), options.iterations ?? 80);
    const unit = Math.sqrt(sc.triangles.length / Math.PI); // spacing 1 on the unit disk
    const k = spacing * unit;
    const xs = pos.map((p) => p.x);
    const shift = offset - Math.min(...xs) * k;
    offset += (Math.max(...xs) - Math.min(...xs)) * k + 4 * spacing;
    return { sc, pos: pos.map((p) => ({ x: p.x * k + shift, y: p.y * k })) };
  });
  const vertex = (x: number) => placed[where.get(x)!.piece];

  const crossingPoint = (x: number) => vertex(x).pos[vertex(x).sc.centre(where.get(x)!.local)];
  const passIndex = new Map<string, number>(); // `${crossing}:${over|under}` -> raw polyline index
  const rawPaths = o.components.map((labels, component) => {
    const pts: Point[] = [];
    for (const label of labels) {
      const tail = o.tail.get(label)!;
      const head = o.head.get(label)!;
      const { sc, pos } = vertex(tail.crossing);
      const local = (x: number) => where.get(x)!.local;
      passIndex.set(`${tail.crossing}:${tail.position % 2 === 1 ? 'over' : 'under'}:${component}`, pts.length);
      pts.push(crossingPoint(tail.crossing));
      pts.push(pos[sc.slot(local(tail.crossing), tail.position)]);
      pts.push(pos[sc.midpoint(label)]);
      pts.push(pos[sc.slot(local(head.crossing), head.position)]);
    }
    return pts;
  });
  const paths = rawPaths.map((pts) => chaikin(pts, true, rounds));

  const fraction = (component: number, key: string): number => {
    const arc = cumulative(rawPaths[component]);
    return arc[passIndex.get(`${key}:${component}`)!] / arc[arc.length - 1];
  };
  const crossings = pd.map((x, i): LayoutCrossing => {
    const under = o.componentOf.get(x[0])!;
    const over = o.componentOf.get(x[1])!;
    return { at: crossingPoint(i), over: { component: over, fraction: fraction(over, `${i}:over`) }, under: { component: under, fraction: fraction(under, `${i}:under`) } };
  });

  const circles = Array.from({ length: unknots }, (_, k) => {
    const r = 2 * spacing;
    const cx = offset + r + k * (2 * r + 2 * spacing);
    return Array.from({ length: 48 }, (_, j) => ({ x: cx + r * Math.cos((2 * Math.PI * j) / 48), y: -r * Math.sin((2 * Math.PI * j) / 48) }));
  });
  return { paths: [...paths, ...circles], crossings };
}
