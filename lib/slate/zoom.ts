// How the Slate's camera follows zoom gestures: a zoom keeps the point under the fingers (or the
// pointer) where it is; a pinch is a zoom about where it started plus the two fingers' pan.
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
