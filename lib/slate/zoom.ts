// How the Slate's camera follows zoom gestures: a zoom keeps the point under the fingers (or the
// pointer) where it is; a pinch is a zoom about where it started plus the two fingers' pan. And
// how it follows the board's width while no gesture moved it since the last fit.
import type { Point } from '@/shared/drawing/point';
import { fitView, toWorld } from './picture';
import type { View } from './slate-store';

/** Zoom by factor f about the screen point c, the scale kept within 0.15x-8x. */
export const zoomAbout = (v: View, f: number, c: Point): View => {
  const k = Math.min(8, Math.max(0.15, v.k * f));
  const g = k / v.k;
  return { k, x: c.x - g * (c.x - v.x), y: c.y - g * (c.y - v.y) };
};

/** Where a pinch has taken the view: scaled about its first focal point, then panned by shift. */
export interface Pinch { from: View; scale: number; focal: Point; shift: Point }
export const pinchedView = ({ from, scale, focal, shift }: Pinch): View => {
  const v = zoomAbout(from, scale, focal);
  return { ...v, x: v.x + shift.x, y: v.y + shift.y };
};

/** A wheel turn zooms about the pointer; 400 px of wheel is a factor of e. */
export const wheelView = (v: View, deltaY: number, at: Point): View => zoomAbout(v, Math.exp(-deltaY / 400), at);

/**
 * What the last fit framed, in world units, so that the view can be fitted again at another
 * board size: the drawing's bounding box (with fitView's margin), or for an empty board the
 * part of the world it showed (no margin), where a hand drawing then goes.
 */
export interface FitBase { corners: [Point, Point]; margin: number | undefined }

export function fitBaseOf(points: readonly Point[], view: View, width: number, height: number): FitBase {
  if (points.length === 0) return { corners: [toWorld(view, { x: 0, y: 0 }), toWorld(view, { x: width, y: height })], margin: 0 };
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  return { corners: [{ x: Math.min(...xs), y: Math.min(...ys) }, { x: Math.max(...xs), y: Math.max(...ys) }], margin: undefined };
}

/** The fit on a board of this size: computed from the base alone, so a resize and its reverse give the same view. */
export const refit = (base: FitBase, width: number, height: number): View => fitView(base.corners, width, height, base.margin);
