// A layout turned into an editable Sketch: each path becomes a closed component drawn in its
// direction of travel, and crossings where the default rule (later stroke under) disagrees
// with the PD code get a flip. Framings follow the diagram's components.

import { analyse } from '@/shared/drawing/analyse';
import { DrawingOptions } from '@/shared/drawing/options';
import { dist } from '@/shared/drawing/point';
import { addPath, emptySketch, flipCrossing, setFraming, Sketch } from '@/shared/drawing/sketch';
import { LinkLayout } from './layout';

// Distance between two fractions of a closed path, going the short way round.
const around = (p: number, q: number) => Math.min(Math.abs(p - q), 1 - Math.abs(p - q));

export function layoutToSketch(layout: LinkLayout, framings: readonly (number | null)[] = [], options: Partial<DrawingOptions> = {}): Sketch {
  let s = layout.paths.reduce((acc, path) => addPath(acc, path, true, options), emptySketch);
  const ids = s.components.map((c) => c.id);
  framings.forEach((f, k) => {
    if (f !== null && k < ids.length) s = setFraming(s, ids[k], f);
  });
  const a = analyse(s, options);
  const length = new Map(a.paths.map((p) => [p.id, p.length]));
  for (const c of a.crossings) {
    const target = layout.crossings.reduce((best, x) => (dist(x.at, c.at) < dist(best.at, c.at) ? x : best));
    const overIsRight =
      target.over.component !== target.under.component
        ? ids[target.over.component] === c.over
        : around(c.overArc / length.get(c.over)!, target.over.fraction) < around(c.underArc / length.get(c.under)!, target.over.fraction);
    if (!overIsRight) s = flipCrossing(s, { a: c.over, b: c.under, at: c.at }, options);
  }
  return s;
}
