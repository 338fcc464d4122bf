// How the Slate's camera follows zoom gestures: a zoom keeps the point under the fingers (or the
// pointer) where it is; a pinch is a zoom about where it started plus the two fingers' pan. And
// how it follows the board's size while no gesture moved it since the last fit.
import type { Point } from '@/shared/drawing/point';
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

/** A view and the board size it was made for. */
export interface SizedView { view: View; size: { width: number; height: number } }

/**
 * The fitted view `base` on a board of another size: what `base` showed is scaled to fit the
 * new board, about its centre. Computed from `base` alone, so a resize and its reverse give the
 * fit back exactly (a phone turned wide and back, or a screenshot at another size).
 */
export const resizedView = (base: SizedView, width: number, height: number): View => {
  const { view: v, size } = base;
  const r = Math.min(width / size.width, height / size.height);
  return { k: v.k * r, x: width / 2 - r * (size.width / 2 - v.x), y: height / 2 - r * (size.height / 2 - v.y) };
};
