// What the canvas draws for each band: its ribbon along the core (cut where the band passes
// under a strand), its number with its half twists, and its core/strand crossings (the Bands
// tool's tap targets). World units in, screen pixels out.
import { bandShapes } from '@/shared/drawing/band-shape';
import { defaultOptions } from '@/shared/drawing/options';
import { bandsOf } from '@/shared/drawing/bands';
import { visiblePieces } from '@/shared/drawing/pieces';
import { arcsOf, pointAt } from '@/shared/drawing/polyline';
import type { Point } from '@/shared/drawing/point';
import type { Sketch } from '@/shared/drawing/sketch';
import { toScreen } from './picture';
import type { View } from './slate-store';

export interface BandPicture {
  id: string;
  number: number;
  /** SVG path data of the ribbon's visible pieces, in screen coordinates. */
  pieces: string[];
  /** Ribbon width on screen. */
  width: number;
  badge: { at: Point };
  /** The badge's text: the number, and the half twists when there are any. */
  text: string;
  crossings: { at: Point; component: string; under: boolean }[];
  /** Why the band cannot be read as it is drawn, or null. */
  problem: string | null;
}

/** Half-length of the cut in a band where it passes under a strand, in world units. */
const underGap = 12;

const signed = (n: number) => (n > 0 ? `+${n}` : `−${-n}`);

export function bandPictures(sketch: Sketch, view: View): BandPicture[] {
  const shapes = bandShapes(sketch);
  const data = (points: readonly Point[]) => points.map((p, i) => `${i ? 'L' : 'M'}${toScreen(view, p).x.toFixed(1)} ${toScreen(view, p).y.toFixed(1)}`).join(' ');
  return bandsOf(sketch).map((band, k) => {
    const shape = shapes[k];
    const ok = !('reason' in shape);
    const core = ok ? shape.core : band.core;
    const arcs = arcsOf(core, false);
    const crossings = ok ? shape.crossings : [];
    const gaps = crossings.filter((c) => c.under).map((c) => ({ from: c.arc - underGap, to: c.arc + underGap }));
    const middle = pointAt(core, arcs, arcs[arcs.length - 1] / 2, false);
    return {
      id: band.id,
      number: k + 1,
      pieces: visiblePieces(core, false, gaps).map(data),
      width: 2 * defaultOptions.bandHalfWidth * view.k,
      badge: { at: toScreen(view, middle) },
      text: band.twists ? `${k + 1} · ${signed(band.twists)} half` : `${k + 1}`,
      crossings: crossings.map((c) => ({ at: toScreen(view, c.at), component: c.component, under: c.under })),
      problem: ok ? null : shape.reason,
    };
  });
}
