// A clean planar picture of any PD code: each connected piece is refined to a triangulated
// disk (scaffold.ts), embedded by Tutte's method with a large face outside, relaxed by a
// planarity-preserving force model, and its strands are drawn through the crossing centres
// and edge midpoints (or the scaffold's slot vertices too), rounded by Chaikin corner cutting.
// Every picture is checked by the drawing analysis before it is returned. Pieces are set side
// by side, crossingless unknots as circles after them. Coordinates are on screen (y down) and
// the counterclockwise order of every PD crossing is counterclockwise as seen.

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
  /**
   * Whether the picture was verified: its strands cross exactly at the crossings, with no
   * degeneracy. When false (rare: no outer face and scale tried gave a clean picture) the
   * picture is only a sketch of the diagram and must not be read back as its PD code.
   */
  readonly faithful: boolean;
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

const area = (a: Point, b: Point, c: Point) => (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);

/**
 * Vertex positions of one connected piece (its crossings renumbered 0..k-1) with its
 * `rank`-th largest face outside, at unit spacing.
 */
function embedPiece(pd: PDCode, iterations: number, rank: number) {
  const sc = scaffold(pd, rank);
  const m = sc.outer.length;
  const radius = Math.sqrt(sc.triangles.length / Math.PI);
  const fixed = new Map(sc.outer.map((v, k) => [v, { x: radius * Math.cos((2 * Math.PI * k) / m), y: radius * Math.sin((2 * Math.PI * k) / m) }]));
  let pos = relax({
    positions: tutte(sc.vertexCount, sc.edges, fixed),
    springs: springsOf(pd, sc),
    triangles: sc.triangles,
    fixed: new Set(sc.outer),
    iterations,
  });
  // Seen on screen, slots 0, 1, 2 of a crossing must turn counterclockwise (y down: area < 0).
  if (area(pos[sc.slot(0, 0)], pos[sc.slot(0, 1)], pos[sc.slot(0, 2)]) > 0) pos = pos.map((p) => ({ x: p.x, y: -p.y }));
  return { sc, pos };
}

const cyclicEqual = (xs: readonly number[], ys: readonly number[]) =>
  xs.length === ys.length && (xs.length === 0 || xs.some((_, k) => xs.every((x, i) => x === ys[(i + k) % ys.length])));

// The strands cross exactly at the crossing centres: every crossing found is matched to its
// nearest centre (within one spacing, a different one each time), there is no degeneracy, and
// along every component the crossings come in the PD code's order (so the picture has the
// same Gauss code; the signs are then set by layoutToSketch).
function faithful(paths: readonly Point[][], centres: readonly Point[], order: readonly (readonly number[])[], spacing: number): boolean {
  const found = findCrossings(paths.map((points, k) => ({ id: `${k}`, points })), defaultOptions);
  if (found.markers.length > 0 || found.crossings.length !== centres.length) return false;
  const hit = new Set<number>();
  const along: { arc: number; centre: number }[][] = paths.map(() => []);
  for (const x of found.crossings) {
    const d = centres.map((c) => Math.hypot(x.at.x - c.x, x.at.y - c.y));
    const nearest = d.indexOf(Math.min(...d));
    if (d[nearest] > spacing || hit.has(nearest)) return false;
    hit.add(nearest);
    for (const p of x.passages) along[p.path].push({ arc: p.arc, centre: nearest });
  }
  return along.every((list, k) => cyclicEqual(list.sort((p, q) => p.arc - q.arc).map((p) => p.centre), order[k]));
}

export function layoutPD(pd: PDCode, unknots = 0, options: LayoutOptions = {}): LinkLayout {
  const o = orient(pd);
  const pieces = connectedPieces(pd);
  const where = new Map<number, { piece: number; local: number }>();
  pieces.forEach((crossings, piece) => crossings.forEach((x, local) => where.set(x, { piece, local })));
  const base = options.spacing ?? 24;
  const rounds = options.rounds ?? 2;
  // Tried in turn until the picture is faithful: the largest face outside, then the next
  // largest ones (Tutte embeddings squeeze regions far inside, e.g. behind nugatory crossings);
  // for each, the requested spacing and larger (the drawing tolerances are in pixels), the
  // smooth strands first, then the scaffold polylines.
  let embedded = pieces.map((crossings) => embedPiece(crossings.map((x) => pd[x]), options.iterations ?? 80, 0));
  const centreOf = (x: number) => embedded[where.get(x)!.piece].sc.centre(where.get(x)!.local);
  let fallback: LinkLayout | null = null;
  for (let rank = 0; rank < 4; rank++) {
    if (rank > 0) embedded = pieces.map((crossings) => embedPiece(crossings.map((x) => pd[x]), options.iterations ?? 80, rank));
    for (const scale of [1, 2, 4]) {
      for (const [smooth, r] of [[true, rounds + 1], [false, rounds], [false, 0]] as const) {
        const picture = drawAt(base * scale, smooth, r);
        if (picture.faithful) return picture;
        fallback ??= picture;
      }
    }
  }
  return fallback!;

  function drawAt(spacing: number, smooth: boolean, r: number): LinkLayout {
    let offset = 0;
    const placed = embedded.map(({ pos }) => {
      const xs = pos.map((p) => p.x);
      const shift = offset - Math.min(...xs) * spacing;
      offset += (Math.max(...xs) - Math.min(...xs)) * spacing + 4 * spacing;
      return pos.map((p) => ({ x: p.x * spacing + shift, y: p.y * spacing }));
    });
    const at = (x: number, vertex: number) => placed[where.get(x)!.piece][vertex];
    const centre = (x: number) => at(x, centreOf(x));
    // Control polygons: through crossing centres and edge midpoints (smooth), or also through
    // the slot vertices (the planar scaffold itself).
    const polygon = (labels: readonly number[]): Point[] =>
      labels.flatMap((label) => {
        const tail = o.tail.get(label)!;
        const head = o.head.get(label)!;
        const sc = embedded[where.get(tail.crossing)!.piece].sc;
        const local = (x: number) => where.get(x)!.local;
        const mid = at(tail.crossing, sc.midpoint(label));
        // A kink's loop needs its slots, or it would run out to its midpoint and straight back.
        if (smooth && tail.crossing !== head.crossing) return [centre(tail.crossing), mid];
        return [centre(tail.crossing), at(tail.crossing, sc.slot(local(tail.crossing), tail.position)), mid, at(head.crossing, sc.slot(local(head.crossing), head.position))];
      });
    const paths = o.components.map((labels) => resample(chaikin(polygon(labels), true, r), true, defaultOptions.spacing));
    const crossings = pd.map((x, i): LayoutCrossing => ({
      at: centre(i),
      over: o.componentOf.get(x[1])!,
      under: o.componentOf.get(x[0])!,
      sign: o.signs[i],
    }));
    const circles = Array.from({ length: unknots }, (_, k) => {
      const radius = 2 * base;
      const cx = offset + radius + k * (2 * radius + 2 * base);
      const polygon = Array.from({ length: 48 }, (_, j) => ({ x: cx + radius * Math.cos((2 * Math.PI * j) / 48), y: -radius * Math.sin((2 * Math.PI * j) / 48) }));
      return resample(polygon, true, defaultOptions.spacing);
    });
    const order = o.components.map((labels) => labels.map((label) => o.head.get(label)!.crossing));
    return { paths: [...paths, ...circles], crossings, faithful: faithful(paths, crossings.map((c) => c.at), order, spacing) };
  }
}
