// What the Bands tool does on the Slate: a drag draws a band (refused with the reason when it
// cannot be a band of an orientable surface, or cannot be read into a band presentation), a tap on a band/strand crossing flips it, a tap
// on a band's badge opens its controls. Each edit is one undo step. A drag of a strand carries
// its flips and bands with it; bands it cannot carry are removed, and the notice says so.
import { carryBands } from '@/shared/drawing/band-carry';
import { readBands } from '@/shared/drawing/band-read';
import { bandShapes } from '@/shared/drawing/band-shape';
import { addBand, flipBandCrossing } from '@/shared/drawing/bands';
import { carryFlips } from '@/shared/drawing/carry';
import { dist, type Point } from '@/shared/drawing/point';
import type { Sketch } from '@/shared/drawing/sketch';
import { bandPictures } from './band-pictures';
import { toWorld } from './picture';
import { useSlate } from './slate-store';

/** Tap radius on a band's badge or crossing, in screen pixels. */
const HIT = 18;

const isUnreadable = (sketch: Sketch): boolean => {
  const read = readBands(sketch);
  return read !== null && 'reason' in read;
};

/** A band along the dragged world points, or the notice why not. */
export function finishBand(points: readonly Point[]): void {
  const s = useSlate.getState();
  const doc = s.history.present;
  const r = addBand(doc.sketch, points);
  if ('reason' in r) return s.setBandNotice(r.reason);
  const shape = bandShapes(r.sketch).at(-1)!;
  if ('reason' in shape) return s.setBandNotice(shape.reason);
  // A band whose finger drawing cannot be read is refused now rather than accepted and then
  // left uncertified; unless the bands already there could not be read either.
  const read = readBands(r.sketch);
  if (read && 'reason' in read && !isUnreadable(doc.sketch)) return s.setBandNotice(read.reason);
  s.apply({ ...doc, sketch: r.sketch });
  s.setBandNotice(null);
  s.selectBand(r.sketch.bands!.at(-1)!.id);
}

/** A tap with the Bands tool (screen point); true when it hit a band's crossing or badge. */
export function tapBand(screen: Point): boolean {
  const s = useSlate.getState();
  const doc = s.history.present;
  const pictures = bandPictures(doc.sketch, s.view);
  for (const p of pictures) {
    const x = p.crossings.find((c) => dist(c.at, screen) <= HIT);
    if (x) {
      s.apply({ ...doc, sketch: flipBandCrossing(doc.sketch, p.id, x.component, toWorld(s.view, x.at)) });
      return true;
    }
  }
  const badge = pictures.find((p) => dist(p.badge.at, screen) <= HIT + 4);
  s.selectBand(badge && badge.id !== s.selectedBand ? badge.id : null);
  return badge !== undefined;
}

/** The sketch a move or reshape of a strand makes, its flips and bands carried (or the bands removed, with the notice). */
export function carryThroughDrag(before: Sketch, edited: Sketch): Sketch {
  const { sketch, notice } = carryBands(before, carryFlips(before, edited));
  useSlate.getState().setBandNotice(notice);
  return sketch;
}
