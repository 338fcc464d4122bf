// Bands that follow their strands through a geometric edit (a reshape or a move): an end on an
// edited strand stays at the same fraction of the strand's length (paths are evenly resampled,
// so that is the same fraction of its points), and the core bends to meet it, each point moved
// by a blend of the two ends' moves. Where the core crosses strands, the band keeps its
// over/under when it crosses the same strands in the same order; otherwise, or when the band
// no longer has a shape (too short, non-orientable...), it is removed and the answer says so:
// a band silently attached elsewhere would certify another surface.

import { Band, bandsOf } from './bands';
import { bandShape, closedOf, CoreCrossing } from './band-shape';
import { DrawingOptions, withDefaults } from './options';
import { add, Point, scale, sub } from './point';
import { arcsOf } from './polyline';
import { nearestPointIndex, Sketch, SketchComponent } from './sketch';

export interface CarriedBands {
  readonly sketch: Sketch;
  /** Why bands were removed, or null. */
  readonly notice: string | null;
}

// Where an end at `p` on `was` lies on `now`, the same strand after the edit.
function follow(was: SketchComponent, now: SketchComponent, p: Point): Point {
  if (was.points === now.points) return p;
  const fraction = nearestPointIndex(was, p) / was.points.length;
  return now.points[Math.round(fraction * now.points.length) % now.points.length];
}

// The core with its ends moved to p and q, the points between them blended along the core.
function bend(core: readonly Point[], p: Point, q: Point): Point[] {
  const arcs = arcsOf(core, false);
  const total = arcs[arcs.length - 1] || 1;
  const [d0, d1] = [sub(p, core[0]), sub(q, core[core.length - 1])];
  return core.map((c, i) => add(c, add(scale(d0, 1 - arcs[i] / total), scale(d1, arcs[i] / total))));
}

export function carryBands(before: Sketch, after: Sketch, options: Partial<DrawingOptions> = {}): CarriedBands {
  const bands = bandsOf(before);
  if (bands.length === 0) return { sketch: after, notice: null };
  const o = withDefaults(options);
  const [closedBefore, closedAfter] = [closedOf(before), closedOf(after)];
  const strand = (closed: SketchComponent[], id: string) => closed.find((c) => c.id === id);
  const moved = bands.map((b): Band => {
    const [wasFrom, nowFrom, wasTo, nowTo] = [strand(closedBefore, b.from), strand(closedAfter, b.from), strand(closedBefore, b.to), strand(closedAfter, b.to)];
    if (!wasFrom || !nowFrom || !wasTo || !nowTo) return b;
    const ends = [follow(wasFrom, nowFrom, b.core[0]), follow(wasTo, nowTo, b.core[b.core.length - 1])];
    return { ...b, core: bend(b.core, ends[0], ends[1]), unders: [] };
  });
  const byArc = (cs: readonly CoreCrossing[]) => [...cs].sort((p, q) => p.arc - q.arc);
  const kept: Band[] = [];
  const removed: string[] = [];
  bands.forEach((b, k) => {
    const was = bandShape(closedBefore, bands, k, o);
    // A band that had no shape before the edit is carried as it is: it was already refused.
    if ('reason' in was) {
      kept.push(moved[k]);
      return;
    }
    const now = bandShape(closedAfter, moved, k, o);
    if ('reason' in now) {
      removed.push(now.reason.replace(/\.$/, ''));
      return;
    }
    const [w, n] = [byArc(was.crossings), byArc(now.crossings)];
    if (n.length !== w.length || n.some((c, i) => c.component !== w[i].component)) {
      removed.push(`Band ${k + 1} crosses the strands differently now`);
      return;
    }
    kept.push({ ...moved[k], unders: n.filter((_, i) => w[i].under).map((c) => ({ component: c.component, at: c.at })) });
  });
  const notice = removed.length ? `${removed.length === 1 ? 'A band was' : `${removed.length} bands were`} removed by the edit (undo brings ${removed.length === 1 ? 'it' : 'them'} back): ${removed.join('; ')}.` : null;
  return { sketch: { ...after, bands: kept }, notice };
}
