// A sublink: the diagram with some components deleted. Where a kept strand crossed a deleted
// one it runs straight on; kept framings stay as given (null still means blackboard, now read
// in the smaller diagram).

import { Diagram } from '../diagram';
import { splice } from '../moves/splice';
import { orient, PDError } from '../pd';

/** Keeps the components listed (0-based, in the diagram's order; unknots after the PD ones). */
export function sublink(d: Diagram, keep: readonly number[]): Diagram {
  const o = orient(d.pd);
  const count = o.components.length + d.unknots;
  for (const k of keep) if (!Number.isInteger(k) || k < 0 || k >= count) throw new PDError(`there is no component ${k + 1}`);
  const kept = new Set(keep);
  const dropped = o.components.map((_, c) => c).filter((c) => !kept.has(c));
  const remove: number[] = [];
  const joins: [number, number][] = [];
  d.pd.forEach((x, i) => {
    const under = kept.has(o.componentOf.get(x[0])!);
    const over = kept.has(o.componentOf.get(x[1])!);
    if (under && over) return;
    remove.push(i);
    // The kept strand, if any, runs straight through: under a -> c, over between b and d.
    if (under) joins.push([x[0], x[2]]);
    if (over) joins.push([x[1], x[3]]);
  });
  const spliced = splice(d, remove, joins, dropped);
  // Crossingless unknots: keep those listed, in order, after the PD components that remain.
  const pdCount = spliced.framings.length - spliced.unknots;
  const oldUnknots = d.unknots;
  const newUnknots = spliced.unknots - oldUnknots; // strands that lost all their crossings
  const unknotFramings = [
    ...d.framings.slice(o.components.length).filter((_, u) => kept.has(o.components.length + u)),
    ...spliced.framings.slice(pdCount + oldUnknots, pdCount + oldUnknots + newUnknots),
  ];
  return { pd: spliced.pd, unknots: unknotFramings.length, framings: [...spliced.framings.slice(0, pdCount), ...unknotFramings] };
}
