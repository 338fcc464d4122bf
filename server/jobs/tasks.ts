// The short jobs of the job pool (server/jobs/pool.ts), one export per job, each a plain
// function of one argument run in a pool thread (loaded through worker.cjs).
import type { RunDiagram } from '@/shared/api/runs';
import { summarise } from '../feed/invariants';
import { cellCables } from '../runs/cables';
import { diagramKey } from '../runs/keys';
import { bandStages, BandError } from '@/shared/knot/bands';

/** A sketch's feed summary (crossings, components, Jones). */
export const summary = summarise;

/** A sweep's cables with their reuse keys. */
export const cables = cellCables;

/** A run's reuse key. */
export const runKey = ({ diagram, reduced }: { diagram: Pick<RunDiagram, 'pd' | 'unknots'>; reduced: boolean }) => diagramKey(diagram, reduced);

/** Why a bands run's bands cannot be applied (a missing edge, no common face, a non-orientable band), or null. */
export const bandsProblem = ({ pd, unknots, bands }: Pick<RunDiagram, 'pd' | 'unknots' | 'bands'>): string | null => {
  try {
    bandStages({ pd, unknots, saddles: (bands ?? []).map(([a, b]) => ({ a, b })) });
    return null;
  } catch (err) {
    if (err instanceof BandError) return err.message;
    throw err;
  }
};
