// A sketch's one-line summary for the Sketches list: crossings and Jones polynomial, computed
// once per distinct diagram (lists re-render on every store change).
import type { Diagram as StoredDiagram } from '@/shared/api/sketches';
import { jones } from '@/shared/knot/jones';
import type { Laurent } from '@/shared/poly/laurent';

export interface Summary {
  crossings: number;
  components: number;
  /** null when there is no diagram yet, or it is too large to compute in a list. */
  jones: Laurent | null;
}

/** Lists compute the Jones polynomial only up to this many crossings (the Slate does any). */
const listLimit = 24;
const cache = new Map<string, Summary>();

export function summaryOf(d: StoredDiagram): Summary {
  const key = JSON.stringify([d.pd, d.unknots, d.framings]);
  let s = cache.get(key);
  if (!s) {
    const empty = d.pd.length === 0 && d.unknots === 0;
    const diagram = { pd: d.pd, unknots: d.unknots, framings: d.framings };
    s = {
      crossings: d.pd.length,
      components: d.framings.length,
      jones: empty || d.pd.length > listLimit ? null : jones(diagram),
    };
    cache.set(key, s);
  }
  return s;
}
