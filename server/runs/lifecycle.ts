// How a run ends: its row gets the outcome (only if it has not ended already), a cable sweep
// recomputes its overall progress from its cells and ends with the last one, and the starter
// of a top-level run is notified (in the app, and by e-mail with a link to the result page
// unless they turned run e-mails off: server/notifications).
import { isFinished, type KhResultJson, type RunStatus } from '@/shared/api/runs';
import { groupText, poincareFormat } from '@/shared/khovanov/format';
import { pdToText } from '@/shared/text/codes';
import type { Run } from '../db/entities';
import type { Deps } from '../deps';
import { notify } from '../notifications/use-cases';
import { childrenOf, findRun, updateIf } from './repository';

const live: RunStatus[] = ['queued', 'running'];

export interface Outcome {
  status: 'done' | 'failed' | 'cancelled';
  result?: KhResultJson;
  error?: string;
}

/** Ends a run; false when it had ended already (e.g. cancelled while its result came in). */
export async function finishRun(deps: Deps, id: string, outcome: Outcome): Promise<boolean> {
  const o = selfChecked(outcome);
  const patch = {
    status: o.status,
    finishedAt: deps.now().toISOString(),
    error: o.error ?? null,
    ...(o.result && { result: o.result, progress: 1 }),
  };
  if (!(await updateIf(deps.db, id, live, patch))) return false;
  await afterChange(deps, id);
  return true;
}

/**
 * A result whose graded Euler characteristic differs from the Jones polynomial's (the engine's
 * self-check, shared/khovanov) is wrong: the run fails and keeps no result, so nothing reuses it.
 */
function selfChecked(o: Outcome): Outcome {
  if (o.status !== 'done' || o.result?.euler?.ok !== false) return o;
  return { status: 'failed', error: 'The self-check failed: the Euler characteristic of the computed homology differs from the Jones polynomial, so the result is not kept.' };
}

/** A running computation's progress, from whichever back end computes it; a cell's moves its sweep. */
export async function recordProgress(deps: Deps, id: string, p: { fraction: number; objects: number }): Promise<void> {
  if (await updateIf(deps.db, id, ['running'], { progress: p.fraction, complexSize: p.objects })) await afterChange(deps, id);
}

/** After a run's row changed: a sweep cell updates its sweep; a top-level end sends the mail. */
export async function afterChange(deps: Deps, id: string): Promise<void> {
  const run = await findRun(deps.db, id);
  if (!run) return;
  if (run.parentRunId) await refreshSweep(deps, run.parentRunId);
  else if (isFinished(run.status)) notifyStarter(deps, run);
}

/** Overall progress = mean of the cells' fractions; the sweep ends when every cell has. */
export async function refreshSweep(deps: Deps, sweepId: string): Promise<void> {
  const cells = await childrenOf(deps.db, sweepId);
  const ended = cells.filter((c) => isFinished(c.status));
  const fraction = cells.length ? cells.reduce((s, c) => s + (isFinished(c.status) ? 1 : c.progress), 0) / cells.length : 1;
  if (ended.length < cells.length) {
    await updateIf(deps.db, sweepId, live, { progress: fraction });
    return;
  }
  const done = ended.filter((c) => c.status === 'done').length;
  const failed = ended.filter((c) => c.status === 'failed').length;
  const status: Outcome['status'] = done > 0 ? 'done' : failed > 0 ? 'failed' : 'cancelled';
  const error = failed > 0 ? `${failed} of ${cells.length} cable${cells.length === 1 ? '' : 's'} failed; see the cells` : undefined;
  if (await updateIf(deps.db, sweepId, live, { status, progress: 1, error: error ?? null, finishedAt: deps.now().toISOString() })) {
    const sweep = await findRun(deps.db, sweepId);
    if (sweep) notifyStarter(deps, sweep);
  }
}

const cut = (s: string, n: number) => (s.length > n ? s.slice(0, n - 1) + '…' : s);

const whatOf = (run: Run) => `${run.kind === 'cable-sweep' ? 'Cable sweep' : run.kind === 'bands' ? 'Unlink check of the bands' : 'Khovanov homology'} over ${run.ring}${run.reduced ? ', reduced' : ''}`;

/** The app's one line about the outcome: the Poincare polynomial with real superscripts, kept short (the page has it all). */
function summaryOf(run: Run): string {
  const what = whatOf(run);
  if (run.status !== 'done') return cut(`${what}: ${run.error ?? run.status}`, 300);
  const kh = run.result ? `: Poincaré polynomial ${cut(poincareFormat(run.result.poincare, 'unicode'), 160)}, ${run.result.thin ? 'thin' : 'thick'}` : '';
  return `${what}${kh}${run.reusedFrom ? ' (a stored result of the same diagram, reused)' : ''}`;
}

/** Over Z, the torsion of the table, group by group: "Z/2 at (3, 7)". */
function torsionOf(result: KhResultJson): string {
  const groups = result.groups.filter((g) => g.torsion.length > 0);
  if (groups.length === 0) return 'Torsion: none';
  const shown = groups.slice(0, 40).map((g) => `${groupText({ ...g, free: 0 }, result.ring)} at (${g.i}, ${g.j})`);
  return `Torsion: ${shown.join('; ')}${groups.length > shown.length ? `; and ${groups.length - shown.length} more groups` : ''}`;
}

/** The mail's lines: what ran on what input, in full, then the result's polynomial and torsion. */
function detailsOf(run: Run): string[] {
  const input = [`${whatOf(run)}${run.reduced ? ` at component ${(run.result?.component ?? 0) + 1}` : ''}, ${run.crossings} crossings.`];
  if (run.source) input.push(cut(`Given as: ${run.source}`, 4000));
  input.push(cut(`PD code: ${pdToText(run.diagram.pd)}`, 4000));
  if (run.status !== 'done') return [...input, '', run.error ?? run.status];
  if (!run.result) return [...input, '', summaryOf(run)];
  const r = run.result;
  return [...input, '', cut(`Poincaré polynomial: ${poincareFormat(r.poincare, 'text')}`, 4000), ...(r.ring === 'Z' ? [cut(torsionOf(r), 4000)] : []), `${r.width} diagonal${r.width === 1 ? '' : 's'}: ${r.thin ? 'thin' : 'thick'}`];
}

/** Sent after the row is written and never holds up the run; a failure is logged. */
function notifyStarter(deps: Deps, run: Run): void {
  const status = run.status === 'done' ? 'succeeded' : run.status === 'cancelled' ? 'cancelled' : 'failed';
  notify(deps, run.startedBy, 'run_finished', { runId: run.id, sketchId: run.sketchId ?? '', sketchTitle: run.label, status, summary: summaryOf(run), what: whatOf(run), details: detailsOf(run) }).catch(
    (err: unknown) => deps.log.error({ err, runId: run.id }, 'run notification failed'),
  );
}
