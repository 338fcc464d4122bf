// The Sketch: an immutable model of what was drawn. Every edit is a pure function returning a
// new Sketch, so a UI can keep the old ones for undo/redo (see history.ts). Paths are stored
// smoothed and evenly resampled, in drawing order; orientation is the drawing direction unless
// the component is reversed (a flag, so reversing never changes which passage was drawn later).

import type { Band } from './bands';
import { DrawingOptions, withDefaults } from './options';
import { add, dist, Point, scale } from './point';
import { closeStroke } from './close';
import { resample, smoothPath } from './smooth';

export interface SketchComponent {
  readonly id: string;
  /** Drawing rank: between two components, the one with the larger seq passes under by default. */
  readonly seq: number;
  /** Smoothed path in drawing order; a closed path does not repeat its first point. */
  readonly points: readonly Point[];
  /** Open strands are unfinished: shown, but not part of the diagram. */
  readonly closed: boolean;
  /** Orientation runs against the drawing direction. */
  readonly reversed: boolean;
  /** null = blackboard framing. */
  readonly framing: number | null;
}

/** A crossing whose default over/under (later stroke under) is swapped. */
export interface Flip {
  readonly a: string;
  readonly b: string;
  readonly at: Point;
}

export interface Sketch {
  readonly components: readonly SketchComponent[];
  readonly flips: readonly Flip[];
  readonly nextSeq: number;
  /** Bands on the drawing (bands.ts); absent in drawings saved before bands existed. */
  readonly bands?: readonly Band[];
}

export const emptySketch: Sketch = { components: [], flips: [], nextSeq: 1 };

const replace = (s: Sketch, id: string, f: (c: SketchComponent) => SketchComponent): Sketch => ({
  ...s,
  components: s.components.map((c) => (c.id === id ? f(c) : c)),
});

export const componentById = (s: Sketch, id: string): SketchComponent | undefined => s.components.find((c) => c.id === id);

const openStrands = (s: Sketch): SketchComponent[] => s.components.filter((c) => !c.closed);

// The open strand whose chosen end lies within `radius` of p, nearest first.
const nearestEnd = (strands: SketchComponent[], p: Point, end: 'start' | 'finish', radius: number): SketchComponent | undefined => {
  let best: SketchComponent | undefined;
  let bestDistance = radius;
  for (const c of strands) {
    const q = end === 'start' ? c.points[0] : c.points[c.points.length - 1];
    const d = dist(p, q);
    if (d <= bestDistance) [best, bestDistance] = [c, d];
  }
  return best;
};

/**
 * Adds a stroke of raw touch points (the point where the finger went down first). It continues
 * an open strand whose end is near the stroke's start; it closes into a component when it comes
 * back near its own start (close.ts: an overshoot is trimmed), or joins an open strand whose
 * start is near its end (closing if that strand's end is near this stroke's start).
 * A stroke with fewer than two distinct points (a tap) leaves the sketch unchanged.
 */
export function addStroke(s: Sketch, raw: readonly Point[], options: Partial<DrawingOptions> = {}): Sketch {
  const o = withDefaults(options);
  const stroke = smoothPath(raw, false, o.spacing);
  if (stroke.length < 2) return s;
  const open = openStrands(s);
  const before = nearestEnd(open, stroke[0], 'finish', o.closeRadius);
  let joined = closeStroke(before ? [...before.points, ...stroke] : stroke, o);
  const used = new Set(before ? [before.id] : []);
  if (!joined.closed) {
    const end = joined.points[joined.points.length - 1];
    const after = nearestEnd(open.filter((c) => !used.has(c.id)), end, 'start', o.closeRadius);
    if (after) {
      joined = closeStroke([...joined.points, ...after.points], o);
      used.add(after.id);
    }
  }
  const { points, closed } = joined;
  const keep = before ?? { id: `c${s.nextSeq}`, seq: s.nextSeq, reversed: false, framing: null };
  const component: SketchComponent = {
    id: keep.id,
    seq: keep.seq,
    reversed: keep.reversed,
    framing: keep.framing,
    closed,
    points: closed ? smoothPath(points, true, o.spacing, 1) : resample(points, false, o.spacing),
  };
  const components = s.components.filter((c) => !used.has(c.id));
  return { ...s, components: [...components, component], nextSeq: s.nextSeq + (before ? 0 : 1) };
}

/**
 * Adds a path as one component exactly as given: already smooth and evenly spaced (the layout
 * makes its paths so, and checks them as they will be analysed).
 */
export function addPath(s: Sketch, points: readonly Point[], closed: boolean): Sketch {
  const component: SketchComponent = { id: `c${s.nextSeq}`, seq: s.nextSeq, points, closed, reversed: false, framing: null };
  return { ...s, components: [...s.components, component], nextSeq: s.nextSeq + 1 };
}

export const reverseComponent = (s: Sketch, id: string): Sketch => replace(s, id, (c) => ({ ...c, reversed: !c.reversed }));

export const setFraming = (s: Sketch, id: string, framing: number | null): Sketch => {
  if (framing !== null && !Number.isSafeInteger(framing)) throw new RangeError(`framing must be an integer or null, got ${framing}`);
  return replace(s, id, (c) => ({ ...c, framing }));
};

/** Removes a component, the flips of its crossings and the bands attached to it. */
export const deleteComponent = (s: Sketch, id: string): Sketch => ({
  ...s,
  components: s.components.filter((c) => c.id !== id),
  flips: s.flips.filter((f) => f.a !== id && f.b !== id),
  ...(s.bands ? { bands: s.bands.filter((b) => b.from !== id && b.to !== id) } : {}),
});

/** Translates a component; flips of its self-crossings travel with it. */
export const moveComponent = (s: Sketch, id: string, delta: Point): Sketch => ({
  ...replace(s, id, (c) => ({ ...c, points: c.points.map((p) => add(p, delta)) })),
  flips: s.flips.map((f) => (f.a === id && f.b === id ? { ...f, at: add(f.at, delta) } : f)),
});

/**
 * Drags the piece of a component around point `index` by `delta`; points within arc length
 * `radius` follow with a smooth (cosine) falloff. The path is resampled; crossings are
 * re-derived by the analysis.
 */
export function reshapeComponent(s: Sketch, id: string, index: number, delta: Point, radius: number, options: Partial<DrawingOptions> = {}): Sketch {
  const o = withDefaults(options);
  return replace(s, id, (c) => {
    const n = c.points.length;
    const moved = c.points.map((p, i) => {
      const steps = c.closed ? Math.min(Math.abs(i - index), n - Math.abs(i - index)) : Math.abs(i - index);
      const arc = steps * o.spacing;
      return arc >= radius ? p : add(p, scale(delta, 0.5 + 0.5 * Math.cos((Math.PI * arc) / radius)));
    });
    return { ...c, points: resample(moved, c.closed, o.spacing) };
  });
}

/** Index of the point of a component nearest to p (for picking the piece to drag). */
export function nearestPointIndex(c: SketchComponent, p: Point): number {
  let best = 0;
  c.points.forEach((q, i) => {
    if (dist(p, q) < dist(p, c.points[best])) best = i;
  });
  return best;
}

/** Toggles the over/under of the crossing of components a and b nearest to `at`. */
export function flipCrossing(s: Sketch, crossing: { a: string; b: string; at: Point }, options: Partial<DrawingOptions> = {}): Sketch {
  const o = withDefaults(options);
  const same = (f: Flip) => (f.a === crossing.a && f.b === crossing.b) || (f.a === crossing.b && f.b === crossing.a);
  const existing = s.flips.find((f) => same(f) && dist(f.at, crossing.at) <= o.flipRadius);
  if (existing) return { ...s, flips: s.flips.filter((f) => f !== existing) };
  return { ...s, flips: [...s.flips, { a: crossing.a, b: crossing.b, at: crossing.at }] };
}
