// Where a band drawing's finger code sits over the sketch's own knot drawing (without bands):
// the drawn crossings are where they were, since a finger only detours its strand along the band;
// every other crossing of the finger drawing is a finger's (shared/knot/bands/carry.ts takes
// them back). With this, two sketches of one knot drawing compare their surfaces there.

import type { Fingers } from '@/shared/knot/bands';
import type { Analysis } from './analyse';
import type { BandDrawings } from './band-read';
import { dist } from './point';

/** The finger drawing's crossings within this many pixels of a drawn one are that crossing. */
const tolerance = 0.5;

/**
 * The knot drawing (`base`, the sketch's analysis) and, for each crossing of the finger drawing
 * `read`, the drawn crossing it is (-1 for a finger's). `flat` when the drawing has a strand that
 * crosses nothing: the cube leaves such circles out, so the fingers cannot be taken back there.
 */
export function fingersOf(base: Analysis, read: BandDrawings): Fingers | { reason: string; flat: boolean } {
  const drawn = base.diagram?.diagram;
  if (!drawn) return { reason: base.markers[0]?.message ?? 'Draw closed strands first.', flat: false };
  if (drawn.pd.length === 0 || drawn.unknots > 0) return { reason: 'A strand of the knot drawing crosses nothing.', flat: true };
  const of = read.finger.crossings.map((c) => base.crossings.findIndex((b) => dist(b.at, c.at) <= tolerance));
  const found = of.filter((i) => i >= 0);
  if (found.length !== drawn.pd.length || new Set(found).size !== found.length) return { reason: 'A band lies across a crossing of the drawing: move it off the crossing.', flat: false };
  return { common: drawn.pd, of };
}
