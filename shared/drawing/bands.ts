// Bands drawn on a Sketch: each joins a point of one closed component to a point of another
// (or of the same one) along a drawn core. The band lies flat along its core apart from its
// half twists; where the core crosses a strand the band passes over it unless the user set it
// under (stored like a crossing flip, by position). Edits are pure, like the rest of the Sketch.

import { DrawingOptions, withDefaults } from './options';
import { dist, Point } from './point';
import { Sketch, SketchComponent } from './sketch';
import { smoothPath } from './smooth';

export interface BandUnder {
  readonly component: string;
  readonly at: Point;
}

export interface Band {
  readonly id: string;
  /** Component ids of the strands at the core's first and last point. */
  readonly from: string;
  readonly to: string;
  /** The core as drawn, smoothed; its ends lie on the two strands. */
  readonly core: readonly Point[];
  /** Signed half twists: positive ones are right-handed (docs/conventions.md, Bands). */
  readonly twists: number;
  /** Core/strand crossings where the band passes under the strand. */
  readonly unders: readonly BandUnder[];
}

/** How far from a strand a band's drag may start or end and still attach to it. */
export const bandSnapRadius = 24;

export const bandsOf = (s: Sketch): readonly Band[] => s.bands ?? [];

const nearestOn = (components: readonly SketchComponent[], p: Point): { component: SketchComponent; point: Point } | null => {
  let best: { component: SketchComponent; point: Point } | null = null;
  let bestDistance = bandSnapRadius;
  for (const component of components) {
    for (const q of component.points) {
      const d = dist(p, q);
      if (d <= bestDistance) [best, bestDistance] = [{ component, point: q }, d];
    }
  }
  return best;
};

export type BandEdit = { sketch: Sketch } | { reason: string };

/**
 * A band along a dragged path (raw touch points, first where the finger went down): both ends
 * must lie near closed strands, and are moved onto them.
 */
export function addBand(s: Sketch, raw: readonly Point[], options: Partial<DrawingOptions> = {}): BandEdit {
  const o = withDefaults(options);
  const closed = s.components.filter((c) => c.closed);
  const core = smoothPath(raw, false, o.spacing);
  if (core.length < 2) return { reason: 'Drag from one strand to another to draw a band.' };
  const start = nearestOn(closed, core[0]);
  const end = nearestOn(closed, core[core.length - 1]);
  if (!start || !end) return { reason: 'A band starts on a strand and ends on a strand: drag from one strand to another.' };
  if (dist(start.point, end.point) < 40) return { reason: 'The ends of a band must be farther apart.' };
  const band: Band = {
    id: `b${s.nextSeq}`,
    from: start.component.id,
    to: end.component.id,
    core: [start.point, ...core.slice(1, -1), end.point],
    twists: 0,
    unders: [],
  };
  return { sketch: { ...s, bands: [...bandsOf(s), band], nextSeq: s.nextSeq + 1 } };
}

const replaceBand = (s: Sketch, id: string, f: (b: Band) => Band): Sketch => ({ ...s, bands: bandsOf(s).map((b) => (b.id === id ? f(b) : b)) });

export const deleteBand = (s: Sketch, id: string): Sketch => ({ ...s, bands: bandsOf(s).filter((b) => b.id !== id) });

export const setBandTwists = (s: Sketch, id: string, twists: number): Sketch => {
  if (!Number.isSafeInteger(twists)) throw new RangeError(`half twists must be an integer, got ${twists}`);
  return replaceBand(s, id, (b) => ({ ...b, twists }));
};

/** Toggles whether the band passes under the strand `component` at its crossing nearest `at`. */
export function flipBandCrossing(s: Sketch, id: string, component: string, at: Point, options: Partial<DrawingOptions> = {}): Sketch {
  const o = withDefaults(options);
  return replaceBand(s, id, (b) => {
    const existing = b.unders.find((u) => u.component === component && dist(u.at, at) <= o.flipRadius);
    return { ...b, unders: existing ? b.unders.filter((u) => u !== existing) : [...b.unders, { component, at }] };
  });
}
