// The reuse key of a run's diagram. Canonical forms cost a few passes over every starting edge,
// so keys are computed in the job pool (server/jobs), never on the request thread.
import { createHash } from 'node:crypto';
import type { RunDiagram } from '@/shared/api/runs';
import { canonicalPD } from '@/shared/knot/canonical';

/**
 * SHA-256 of the canonical PD code (shared/knot/canonical.ts: least relabelling over all
 * starting edges, so any relabelling or reordering of the same diagram gives the same key) with
 * the unknot count and, for reduced runs, the marked component labelled first.
 */
export function diagramKey(d: Pick<RunDiagram, 'pd' | 'unknots'>, reduced: boolean): string {
  const canonical = canonicalPD(d.pd, reduced && d.pd.length > 0 ? 0 : undefined);
  return createHash('sha256').update(JSON.stringify({ pd: canonical, unknots: d.unknots })).digest('hex');
}
