// How a run ends: its row gets the outcome (only if it has not ended already), a cable sweep
// recomputes its overall progress from its cells and ends with the last one, and the starter
// of a top-level run is notified (in the app, and by e-mail with a link to the result page
// unless they turned run e-mails off: server/notifications).
import { isFinished, type KhResultJson, type RunStatus } from '@/shared/api/runs';
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

/** What the notification says about the outcome, in one line. */
function summaryOf(run: Run): string {
  const what = `${run.kind === 'cable-sweep' ? 'Cable sweep' : 'Khovanov homology'} over ${run.ring}${run.reduced ? ' (reduced)' : ''}`;
  if (run.status !== 'done') return `${what}: ${run.error ?? run.status}`.slice(0, 500);
  const kh = run.result ? `, Poincare polynomial ${run.result.poincareText}, ${run.result.thin ? 'thin' : 'thick'}` : '';
  return `${what}${kh}${run.reusedFrom ? ' (a stored result of the same diagram, reused)' : ''}`.slice(0, 500);
}

/** Sent after the row is written and never holds up the run; a failure is logged. */
function notifyStarter(deps: Deps, run: Run): void {
  const status = run.status === 'done' ? 'succeeded' : run.status === 'cancelled' ? 'cancelled' : 'failed';
  notify(deps, run.startedBy, 'run_finished', { runId: run.id, sketchId: run.sketchId ?? '', sketchTitle: run.label, status, summary: summaryOf(run) }).catch(
    (err: unknown) => deps.log.error({ err, runId: run.id }, 'run notification failed'),
  );
}
