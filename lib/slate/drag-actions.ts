// What one finger does on the Slate, by tool: a drag draws a strand or a band, moves or
// reshapes a component, or pans; a tap opens a framing badge, reverses at an arrow, flips a
// crossing or selects a strand. Drags only change the preview; ending one commits one undo step.
import type { Analysis } from '@/shared/drawing/analyse';
import { componentNear, crossingNear } from '@/shared/drawing/pick';
import { dist, type Point } from '@/shared/drawing/point';
import { addStroke, flipCrossing, moveComponent, reshapeComponent, reverseComponent } from '@/shared/drawing/sketch';
import { carryThroughDrag, finishBand, tapBand } from './band-actions';
import { toWorld, type StrandPicture } from './picture';
import type { SlateDoc } from './record';
import { useSlate, type View } from './slate-store';

export type Drag =
  | { kind: 'draw' | 'band'; points: Point[] }
  | { kind: 'move' | 'reshape'; id: string; index: number; origin: Point; from: SlateDoc }
  | { kind: 'pan'; origin: Point; from: View };

/** What the canvas shows now: the gesture handlers are made once and read it through a ref. */
export interface CanvasNow {
  analysis: Analysis;
  doc: SlateDoc;
  pictures: StrandPicture[];
  onFraming: (id: string) => void;
}

/** Hit radii of taps, in screen pixels: on a strand or crossing; on the framing badge (a 44 px target); on the arrow. */
export const HIT = 18;
const BADGE_HIT = 22;
const ARROW_HIT = 14;
/** How far along the strand a reshaping drag reaches, in screen pixels. */
const reshapeRadius = 60;

/** The drag a finger going down at this screen point starts, by tool and what is under it. */
export function startDrag(screen: Point, now: CanvasNow): Drag {
  const s = useSlate.getState();
  const p = toWorld(s.view, screen);
  if (s.tool === 'draw' || s.tool === 'bands') return { kind: s.tool === 'draw' ? 'draw' : 'band', points: [p] };
  const hit = s.tool === 'flip' ? null : componentNear(now.analysis, p, HIT / s.view.k);
  if (hit && (s.tool === 'reshape' || s.tool === 'move')) {
    s.select(hit.id);
    return { kind: s.tool, id: hit.id, index: hit.index, origin: p, from: now.doc };
  }
  return { kind: 'pan', origin: screen, from: s.view };
}

/** Follows the finger; answers the stroke drawn so far when the drag draws one. */
export function dragTo(d: Drag, screen: Point): Point[] | null {
  const s = useSlate.getState();
  if ('points' in d) {
    d.points.push(toWorld(s.view, screen));
    return [...d.points];
  }
  if (d.kind === 'pan') {
    s.setView({ ...d.from, x: d.from.x + screen.x - d.origin.x, y: d.from.y + screen.y - d.origin.y });
  } else {
    const p = toWorld(s.view, screen);
    const delta = { x: p.x - d.origin.x, y: p.y - d.origin.y };
    const edited = d.kind === 'move'
      ? moveComponent(d.from.sketch, d.id, delta)
      : reshapeComponent(d.from.sketch, d.id, d.index, delta, reshapeRadius / s.view.k);
    // Flips and bands are anchored by position; a drag carries them (or removes bands, saying why).
    s.setPreview({ ...d.from, sketch: carryThroughDrag(d.from.sketch, edited) });
  }
  return null;
}

/** The finger lifted: the drag becomes one undo step (a pan changed only the view). */
export function endDrag(d: Drag): void {
  const s = useSlate.getState();
  if (d.kind === 'draw') {
    const doc = s.history.present;
    const next = addStroke(doc.sketch, d.points);
    if (next !== doc.sketch) s.apply({ ...doc, sketch: next });
  } else if (d.kind === 'band') {
    finishBand(d.points);
  } else if (d.kind !== 'pan') {
    if (s.preview) s.apply(s.preview);
  }
}

/** A tap goes to the first thing within reach: a framing badge, an arrow, a band (Bands tool), a
 * crossing, a strand (the selected one again clears the selection). */
export function tapAt(screen: Point, now: CanvasNow): void {
  const s = useSlate.getState();
  const { analysis: a, doc, pictures } = now;
  const badge = pictures.find((p) => p.badge && dist(p.badge.at, screen) <= BADGE_HIT);
  if (badge) return now.onFraming(badge.id);
  const arrow = pictures.find((p) => p.arrow && dist(p.arrow.at, screen) <= ARROW_HIT);
  if (arrow) return s.apply({ ...doc, sketch: reverseComponent(doc.sketch, arrow.id) });
  if (s.tool === 'bands' && tapBand(screen)) return;
  const p = toWorld(s.view, screen);
  const x = crossingNear(a, p, HIT / s.view.k);
  if (x !== null) {
    const c = a.crossings[x];
    return s.apply({ ...doc, sketch: flipCrossing(doc.sketch, { a: c.over, b: c.under, at: c.at }) });
  }
  const hit = componentNear(a, p, HIT / s.view.k);
  s.select(hit && hit.id !== s.selected ? hit.id : null);
}
