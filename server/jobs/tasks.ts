// The short jobs of the job pool (server/jobs/pool.ts), one export per job, each a plain
// function of one argument run in a pool thread (loaded through worker.mjs).
import type { RunDiagram } from '@/shared/api/runs';
import { summarise } from '../feed/invariants';
import { cellCables } from '../runs/cables';
import { diagramKey } from '../runs/keys';

/** A sketch's feed summary (crossings, components, Jones). */
export const summary = summarise;

/** A sweep's cables with their reuse keys. */
export const cables = cellCables;

/** A run's reuse key. */
export const runKey = ({ diagram, reduced }: { diagram: Pick<RunDiagram, 'pd' | 'unknots'>; reduced: boolean }) => diagramKey(diagram, reduced);
