// A clean planar picture of any PD code: each connected piece is refined to a triangulated
// disk (scaffold.ts), embedded by Tutte's method with its largest face outside, relaxed by a
// planarity-preserving force model, and its strands are drawn through the crossing centres,
// slot vertices and edge midpoints, then rounded by Chaikin corner cutting. Pieces are set
// side by side, crossingless unknots as circles after them. Coordinates are on screen (y down)
// and the counterclockwise order of every PD crossing is counterclockwise as seen.

import { findCrossings } from '@/shared/drawing/crossings';
import { defaultOptions } from '@/shared/drawing/options';
import { chaikin, resample } from '@/shared/drawing/smooth';
import { Point } from '@/shared/drawing/point';
import { connectedPieces, orient, PDCode, slotsOf } from '@/shared/knot/pd';
import { relax, Spring } from './relax';
import { Scaffold, scaffold } from './scaffold';
import { tutte } from './tutte';

export interface LayoutCrossing {
  readonly at: Point;
  /** Components (indices into paths) of the over- and under-strand. */
  readonly over: number;
  readonly under: number;
  /** The crossing sign of the PD code; the picture's strands meet with the same rotation. */
  readonly sign: number;
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

// Springs along the refinement's edges, plus "bending" springs across each slot and each
// crossing whose rest length is the straight-line sum, so strands run straight through.
function springsOf(pd: PDCode, sc: Scaffold): Spring[] {
  const springs: Spring[] = sc.edges.map(([a, b], i) => ({ a, b, rest: restOf[sc.kind[i]], weight: 1 }));
  const kinks = new Set([...slotsOf(pd)].filter(([, [p, q]]) => p.crossing === q.crossing).map(([label]) => label));
  pd.forEach((x, i) => {
    for (let p = 0; p < 4; p++) {
      // A kink's loop (an edge from a crossing back to it) is held open instead.
      const straight = restOf.centre + restOf.strand;
      springs.push({ a: sc.centre(i), b: sc.midpoint(x[p]), rest: kinks.has(x[p]) ? 2 * straight : straight, weight: 0.5 });
      if (p < 2) springs.push({ a: sc.slot(i, p), b: sc.slot(i, p + 2), rest: 2 * restOf.centre, weight: 0.5 });
    }
  });
  return springs;
}

/** Vertex positions of one connected piece (its crossings renumbered 0..k-1), unit scale. */
function embedPiece(pd: PDCode, iterations: number) {
  const sc = scaffold(pd);
  const m = sc.outer.length;
  const fixed = new Map(sc.outer.map((v, k) => [v, { x: Math.cos((2 * Math.PI * k) / m), y: Math.sin((2 * Math.PI * k) / m) }]));
  const start = tutte(sc.vertexCount, sc.edges, fixed);
  let pos = relax({
    positions: start,
    springs: springsOf(pd, sc),
    triangles: sc.triangles,
    fixed: new Set(sc.outer),
    iterations,
  });
  // Seen on screen, slots 0, 1, 2 of a crossing must turn counterclockwise (y down: cross < 0).
  const [a, b, c] = [0, 1, 2].map((p) => pos[sc.slot(0, p)]);
  if ((b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x) > 0) pos = pos.map((p) => ({ x: p.x, y: -p.y }));
  return { sc, pos };
}

// The strands cross exactly once near every crossing centre (within one spacing: neighbouring
// centres are farther apart), between the right two components, nowhere else, and without any
// degeneracy.
function faithful(paths: readonly Point[][], centres: readonly { at: Point; pair: string }[], spacing: number): boolean {
  const found = findCrossings(paths.map((points, k) => ({ id: `${k}`, points })), defaultOptions);
  if (found.markers.length > 0 || found.crossings.length !== centres.length) return false;
  const pairOf = (x: (typeof found.crossings)[number]) => [x.passages[0].path, x.passages[1].path].sort().join();
  return centres.every(({ at, pair }) => {
    const near = found.crossings.filter((x) => Math.hypot(x.at.x - at.x, x.at.y - at.y) < spacing);
    return near.length === 1 && pairOf(near[0]) === pair;
  });
}

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
  // Control polygons of the strands, smoothest first: through crossing centres and edge
  // midpoints only; then also through the slot vertices (the planar scaffold itself).
  const polygon = (labels: readonly number[], slots: boolean): Point[] =>
    labels.flatMap((label) => {
      const tail = o.tail.get(label)!;
      const head = o.head.get(label)!;
      const { sc, pos } = vertex(tail.crossing);
      const local = (x: number) => where.get(x)!.local;
      const mid = pos[sc.midpoint(label)];
      // A kink's loop needs its slots, or it would run out to its midpoint and straight back.
      if (!slots && tail.crossing !== head.crossing) return [crossingPoint(tail.crossing), mid];
      return [crossingPoint(tail.crossing), pos[sc.slot(local(tail.crossing), tail.position)], mid, pos[sc.slot(local(head.crossing), head.position)]];
    });
  const attempts: [boolean, number][] = [[false, rounds + 1], [true, rounds], [true, 0]];
  let paths: Point[][] = [];
  for (const [slots, r] of attempts) {
    paths = o.components.map((labels) => resample(chaikin(polygon(labels, slots), true, r), true, defaultOptions.spacing));
    const centres = pd.map((x, i) => ({ at: crossingPoint(i), pair: [o.componentOf.get(x[0])!, o.componentOf.get(x[1])!].sort().join() }));
    if (faithful(paths, centres, spacing)) break;
  }

  const crossings = pd.map((x, i): LayoutCrossing => ({
    at: crossingPoint(i),
    over: o.componentOf.get(x[1])!,
    under: o.componentOf.get(x[0])!,
    sign: o.signs[i],
  }));

  const circles = Array.from({ length: unknots }, (_, k) => {
    const r = 2 * spacing;
    const cx = offset + r + k * (2 * r + 2 * spacing);
    return Array.from({ length: 48 }, (_, j) => ({ x: cx + r * Math.cos((2 * Math.PI * j) / 48), y: -r * Math.sin((2 * Math.PI * j) / 48) }));
  });
  return { paths: [...paths, ...circles], crossings };
}
