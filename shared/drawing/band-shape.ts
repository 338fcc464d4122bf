// The geometry of one band on a drawing: where its core meets its two strands, where its two
// sides leave the first strand and reach the second, where the core crosses strands (and
// whether the band passes under there), where its half twists sit, and whether it is
// orientable. The sides run at +-halfWidth (DrawingOptions.bandHalfWidth) along the core's normal; a half twist swaps them
// over `twistLength` of core with a cosine profile, so the sides cross once in its middle.
// Degenerate input (a band whose core crosses itself, too short to leave its strands, or with
// no room for its twists) answers a reason instead of a shape.

import type { Band } from './bands';
import { bandsOf } from './bands';
import { DrawingOptions, withDefaults } from './options';
import { add, dist, dot, Point, scale, sub } from './point';
import { arcsOf, pointAt, tangentAt } from './polyline';
import { intersect } from './segments';
import { Tip, tipOf } from './band-tip';
import { nearestPointIndex, Sketch, SketchComponent } from './sketch';

const twistLength = 30;
/** Twists keep this far (along the core) from crossings and from the band's ends. */
const twistMargin = 20;

export interface CoreCrossing {
  readonly component: string;
  readonly arc: number;
  readonly at: Point;
  readonly under: boolean;
}

export interface BandShape {
  readonly number: number;
  readonly halfWidth: number;
  readonly core: readonly Point[];
  readonly arcs: readonly number[];
  /** The strands at the core's ends: index into the closed components and point index there. */
  readonly from: { readonly path: number; readonly index: number };
  readonly to: { readonly path: number; readonly index: number };
  /** Core arcs where the sides leave the first strand and reach the second. */
  readonly d0: number;
  readonly d1: number;
  readonly crossings: readonly CoreCrossing[];
  /** Core arc where each half twist begins. */
  readonly twistStarts: readonly number[];
  readonly twistSign: 1 | -1;
  /** Side of the core (along its normal) on which the first strand arrives, in its direction of travel. */
  readonly inSide: 1 | -1;
  /** Where the finger drawing's tip reaches over the second strand (band-tip.ts). */
  readonly tip: Tip;
}

const normal = (t: Point): Point => ({ x: -t.y, y: t.x });
const sign = (x: number): 1 | -1 => (x < 0 ? -1 : 1);

/** Offset of side `side` from the core at core arc s (the sides swap in each twist). */
export function offsetAt(b: BandShape, side: 1 | -1, s: number): number {
  let f = 1;
  for (const t of b.twistStarts) {
    if (s >= t + twistLength) f = -f;
    else if (s > t) return side * b.halfWidth * f * Math.cos((Math.PI * (s - t)) / twistLength);
  }
  return side * b.halfWidth * f;
}

export const corePoint = (b: BandShape, s: number): Point => pointAt(b.core, b.arcs, s, false);
export const coreNormal = (b: BandShape, s: number): Point => normal(tangentAt(b.core, b.arcs, s));
export const sidePoint = (b: BandShape, side: 1 | -1, s: number): Point => add(corePoint(b, s), scale(coreNormal(b, s), offsetAt(b, side, s)));

/** Unit direction of travel of a closed component at point i. */
export function travelAt(c: SketchComponent, i: number): Point {
  const n = c.points.length;
  const d = sub(c.points[(i + 1) % n], c.points[(i + n - 1) % n]);
  return scale(d, (c.reversed ? -1 : 1) / (Math.hypot(d.x, d.y) || 1));
}

// Arcs where the core first gets (from its start) and last is (towards its end) 2w from the
// strand near its attaching point.
function sidesReach(core: readonly Point[], arcs: readonly number[], strand: SketchComponent, index: number, fromStart: boolean, w: number): number {
  const n = strand.points.length;
  const near = Array.from({ length: 41 }, (_, k) => strand.points[(index + k - 20 + n) % n]);
  const total = arcs[arcs.length - 1];
  for (let s = 0; s <= total; s += 1.5) {
    const at = fromStart ? s : total - s;
    const p = pointAt(core, arcs, at, false);
    if (Math.min(...near.map((q) => dist(p, q))) >= 2 * w) return at;
  }
  return fromStart ? total : 0;
}

// Proper intersections of the core between arcs lo..hi with a polyline.
function coreHits(core: readonly Point[], arcs: readonly number[], lo: number, hi: number, other: readonly Point[], closed: boolean): { arc: number; at: Point }[] {
  const hits: { arc: number; at: Point }[] = [];
  const m = closed ? other.length : other.length - 1;
  for (let i = 0; i + 1 < core.length; i++) {
    if (arcs[i + 1] < lo || arcs[i] > hi) continue;
    for (let j = 0; j < m; j++) {
      const hit = intersect({ p: core[i], q: core[i + 1] }, { p: other[j], q: other[(j + 1) % other.length] });
      if (!hit) continue;
      const arc = arcs[i] + hit.t * (arcs[i + 1] - arcs[i]);
      if (arc >= lo && arc <= hi) hits.push({ arc, at: add(core[i], scale(sub(core[i + 1], core[i]), hit.t)) });
    }
  }
  return hits;
}

// The longest stretch of [lo, hi] at least `margin` from every obstacle arc.
function freeStretch(lo: number, hi: number, obstacles: readonly number[], margin: number): [number, number] {
  const stops = [lo - margin, ...[...obstacles].sort((a, b) => a - b), hi + margin];
  let best: [number, number] = [0, -1];
  for (let i = 0; i + 1 < stops.length; i++) {
    const a = stops[i] + margin;
    const b = stops[i + 1] - margin;
    if (b - a > best[1] - best[0]) best = [a, b];
  }
  return best;
}

export function bandShape(closed: readonly SketchComponent[], bands: readonly Band[], k: number, o: DrawingOptions): BandShape | { reason: string } {
  const band = bands[k];
  const number = k + 1;
  const fromPath = closed.findIndex((c) => c.id === band.from);
  const toPath = closed.findIndex((c) => c.id === band.to);
  if (fromPath < 0 || toPath < 0) return { reason: `Band ${number} is attached to a strand that is not closed.` };
  const [a, b] = [closed[fromPath], closed[toPath]];
  const from = { path: fromPath, index: nearestPointIndex(a, band.core[0]) };
  const to = { path: toPath, index: nearestPointIndex(b, band.core[band.core.length - 1]) };
  const core = [a.points[from.index], ...band.core.slice(1, -1), b.points[to.index]];
  const arcs = arcsOf(core, false);
  const w = o.bandHalfWidth;
  const d0 = sidesReach(core, arcs, a, from.index, true, w);
  const d1 = sidesReach(core, arcs, b, to.index, false, w);
  if (d1 - d0 < 2 * w) return { reason: `Band ${number} is too short: draw it longer, away from its strands.` };
  for (let i = 0; i + 1 < core.length; i++) {
    if (coreHits(core.slice(i + 2), arcsOf(core.slice(i + 2), false), 0, Infinity, [core[i], core[i + 1]], false).length) {
      return { reason: `Band ${number} crosses itself: draw its core without loops.` };
    }
  }
  const crossings = closed.flatMap((c) =>
    coreHits(core, arcs, d0, d1, c.points, true).map((h) => ({
      component: c.id,
      ...h,
      under: band.unders.some((u) => u.component === c.id && dist(u.at, h.at) <= o.flipRadius),
    })),
  );
  const otherCores = bands.filter((_, j) => j !== k).flatMap((other) => coreHits(core, arcs, d0, d1, other.core, false).map((h) => h.arc));
  const twists = Math.abs(band.twists);
  const [lo, hi] = freeStretch(d0 + twistMargin, d1 - twistMargin, [...crossings.map((c) => c.arc), ...otherCores], twistMargin);
  if (twists > 0 && twists * twistLength > hi - lo) return { reason: `Band ${number} has no room for ${twists} half twists: draw it longer, or with fewer strands across it.` };
  const first = (lo + hi - twists * twistLength) / 2;
  // The sides leave and reach the strands at d0 and d1, so the core's direction there decides
  // which side meets which end; the drag's first and last points may overshoot the strand, so
  // the core can start or end heading the other way.
  const n0 = normal(tangentAt(core, arcs, d0));
  const n1 = normal(tangentAt(core, arcs, d1));
  const inSide = sign(dot(scale(travelAt(a, from.index), -1), n0));
  // Leaving along side inSide, the first strand's incoming end must reach the second strand's
  // outgoing end: the surface is then oriented with the link (an oriented band move).
  const arrivesOn = twists % 2 === 0 ? inSide : -inSide;
  if (arrivesOn !== sign(dot(travelAt(b, to.index), n1))) {
    return {
      reason: `Band ${number} would make the surface non-orientable: the strands at its ends run the same way across it. Attach it elsewhere, give it a half twist, or reverse a component.`,
    };
  }
  const tip = tipOf(closed, toPath, to.index, pointAt(core, arcs, d1, false), w);
  if (!tip) return { reason: `Band ${number} ends too close to a crossing or another strand: end it farther from them.` };
  return {
    number,
    halfWidth: w,
    core,
    arcs,
    from,
    to,
    d0,
    d1,
    crossings,
    twistStarts: Array.from({ length: twists }, (_, i) => first + i * twistLength),
    twistSign: band.twists < 0 ? -1 : 1,
    inSide,
    tip,
  };
}

/** The closed components bands attach to, as analyse() reads them. */
export const closedOf = (sketch: Sketch): SketchComponent[] => sketch.components.filter((c) => c.closed && c.points.length >= 3);

/** Every band's shape, or why it has none. */
export function bandShapes(sketch: Sketch, options: Partial<DrawingOptions> = {}): (BandShape | { reason: string })[] {
  const o = withDefaults(options);
  const closed = closedOf(sketch);
  const bands = bandsOf(sketch);
  return bands.map((_, k) => bandShape(closed, bands, k, o));
}
