// A layout turned into an editable Sketch: each path becomes a closed component drawn in its
// direction of travel, and crossings where the default rule (later stroke under) disagrees
// with the PD code get a flip: the strands of the picture meet with the PD code's rotation, so
// a crossing is right exactly when its sign is. Framings follow the diagram's components.

import { analyse } from '@/shared/drawing/analyse';
import { dist } from '@/shared/drawing/point';
import { addPath, emptySketch, flipCrossing, setFraming, Sketch } from '@/shared/drawing/sketch';
import { LayoutCrossing, LinkLayout } from './layout';

/** The layout as a Sketch, analysed with the default drawing options (those the layout was checked with). */
export function layoutToSketch(layout: Pick<LinkLayout, 'paths'> & { crossings: readonly Pick<LayoutCrossing, 'at' | 'sign'>[] }, framings: readonly (number | null)[] = []): Sketch {
  let s = layout.paths.reduce((acc, path) => addPath(acc, path, true), emptySketch);
  const ids = s.components.map((c) => c.id);
  framings.forEach((f, k) => {
    if (f !== null && k < ids.length) s = setFraming(s, ids[k], f);
  });
  const a = analyse(s);
  // The strands meet as in the PD code, so the sign alone says which one is over.
  for (const c of a.crossings) {
    const target = layout.crossings.reduce((best, x) => (dist(x.at, c.at) < dist(best.at, c.at) ? x : best));
    if (c.sign !== target.sign) s = flipCrossing(s, { a: c.over, b: c.under, at: c.at });
  }
  return s;
}
