// The Readout summary the feed shows for a stored diagram: crossings, components and the Jones
// polynomial, computed with the knot core (shared/knot) in the job pool (server/jobs) when the
// sketch is written (server/feed/summaries.ts). `key` groups sketches of the same knot type as
// far as cheap invariants tell ("same invariants as"): component count, Jones polynomial,
// determinant and signature, so a knot drawn with more crossings still matches.
import { createHash } from 'node:crypto';
import type { Diagram as StoredDiagram } from '@/shared/api/sketches';
import { diagram } from '@/shared/knot/diagram';
import { linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { jones } from '@/shared/knot/jones';
import { orient } from '@/shared/knot/pd';

/** Above this the feed leaves Jones to a run: tangle contraction grows fast beyond it. */
export const feedJonesMaxCrossings = 120;

export interface Summary {
  crossings: number;
  components: number | null;
  jones: string | null;
  jonesText: string | null;
  key: string | null;
}

/**
 * Degenerate inputs: an empty diagram (nothing drawn) has no Jones polynomial here (null), an
 * invalid PD code gives null components and Jones, a large one null Jones.
 */
export function summarise(d: Pick<StoredDiagram, 'pd' | 'unknots'>): Summary {
  const crossings = d.pd.length;
  const none = { crossings, components: null, jones: null, jonesText: null, key: null };
  if (crossings === 0 && d.unknots === 0) return { ...none, components: 0 };
  let components: number;
  let dg: ReturnType<typeof diagram>;
  try {
    dg = diagram(d.pd, { unknots: d.unknots });
    components = orient(d.pd).components.length + d.unknots;
  } catch {
    return none;
  }
  if (crossings > feedJonesMaxCrossings) return { ...none, components };
  const v = jones(dg);
  const json = JSON.stringify(v.toJSON());
  const key = createHash('sha256').update(`${components}|${json}|${linkDeterminant(dg)}|${linkSignature(dg)}`).digest('hex');
  return { crossings, components, jones: json, jonesText: v.format('t', 'unicode'), key };
}
