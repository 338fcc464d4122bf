// Programmatic drawings for the drawing tests: parametric curves sampled as touch points with
// deterministic jitter.

import { addBand } from '@/shared/drawing/bands';
import { Point } from '@/shared/drawing/point';
import { addStroke, Sketch } from '@/shared/drawing/sketch';
import { seededRng } from '@/shared/knot/moves/random';

/**
 * Touch points along a closed parametric curve over [0, 2 pi), ending just short of the start
 * as a finger would, with up to `noise` pixels of jitter.
 */
export function touches(curve: (t: number) => Point, samples: number, noise = 0.6, seed = 1, from = 0): Point[] {
  const rnd = seededRng(seed); // deterministic jitter
  const out: Point[] = [];
  for (let i = 0; i <= samples * 0.995; i++) {
    const p = curve(from + (2 * Math.PI * i) / samples);
    out.push({ x: p.x + (rnd() - 0.5) * 2 * noise, y: p.y + (rnd() - 0.5) * 2 * noise });
  }
  return out;
}

const at = (cx: number, cy: number, r: number, f: (t: number) => [number, number]) => (t: number): Point => {
  const [x, y] = f(t);
  return { x: cx + r * x, y: cy + r * y };
};

/** The usual trefoil projection (three lobes). */
export const trefoilCurve = at(200, 200, 50, (t) => [Math.sin(t) + 2 * Math.sin(2 * t), Math.cos(t) - 2 * Math.cos(2 * t)]);

/** A four-crossing figure-eight projection. */
export const figureEightCurve = at(200, 200, 55, (t) => [(2 + Math.cos(2 * t)) * Math.cos(3 * t), (2 + Math.cos(2 * t)) * Math.sin(3 * t)]);

/** A circle drawn counterclockwise as seen on screen (y down). */
export const circleCurve = (cx: number, cy: number, r: number) => at(cx, cy, r, (t) => [Math.cos(t), -Math.sin(t)]);

/** Draws each curve as one stroke. */
export function drawCurves(curves: readonly ((t: number) => Point)[], samples = 400, noise = 0.6): Sketch {
  return curves.reduce((s, c, i) => addStroke(s, touches(c, samples, noise, i + 1)), { components: [], flips: [], nextSeq: 1 } as Sketch);
}

/** Points from p to q, evenly spaced (a straight drag). */
export const segment = (p: Point, q: Point, n = 40): Point[] => Array.from({ length: n + 1 }, (_, i) => ({ x: p.x + ((q.x - p.x) * i) / n, y: p.y + ((q.y - p.y) * i) / n }));

/** A band dragged straight from p to q; throws the reason when it is refused. */
export function bandFrom(s: Sketch, p: Point, q: Point): Sketch {
  const r = addBand(s, segment(p, q));
  if ('reason' in r) throw new Error(r.reason);
  return r.sketch;
}

/** The unknot as a tall ellipse about (200, 200), drawn by a finger. */
export const tallEllipse = (t: number): Point => ({ x: 200 + 90 * Math.cos(t), y: 200 - 140 * Math.sin(t) });
