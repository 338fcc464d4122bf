// Small words and numbers the run screens share.
import { formatDuration } from '@/shared/text/duration';
import type { RunDetail, RunStatus, RunSummary } from '@/shared/api/runs';
import { pdToText } from '@/shared/text/codes';

export const statusLabel: Record<RunStatus, string> = {
  queued: 'Queued',
  running: 'Running',
  done: 'Done',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

export function duration(r: Pick<RunSummary, 'startedAt' | 'finishedAt'>, now = Date.now()): string {
  if (!r.startedAt) return '–';
  return formatDuration((r.finishedAt ? Date.parse(r.finishedAt) : now) - Date.parse(r.startedAt));
}

export const ringLabel = (r: Pick<RunSummary, 'ring' | 'reduced'>) => `${r.ring}${r.reduced ? ', reduced' : ''}`;

/** A run's date and time in the reader's locale: "2 Dec 2026, 18:30", or "2 Dec, 18:30" where room is short. */
export const runDate = (iso: string, short = false): string =>
  new Date(iso).toLocaleString(undefined, short ? { month: 'short', day: 'numeric', hour: 'numeric', minute: '2-digit' } : { dateStyle: 'medium', timeStyle: 'short' });

/**
 * What remains, from the time so far and the fraction done (the engine weighs each step by the
 * size its complex is expected to reach): only once a tenth is done and 5 s have passed, before
 * which the ratio says little.
 */
export function remaining(r: Pick<RunSummary, 'startedAt' | 'finishedAt' | 'status' | 'progress'>, now = Date.now()): string | null {
  const f = r.progress.fraction;
  if (r.status !== 'running' || !r.startedAt || f < 0.1 || f >= 1) return null;
  const elapsed = now - Date.parse(r.startedAt);
  if (elapsed < 5000) return null;
  return formatDuration((elapsed * (1 - f)) / f);
}

/** Whether a run's label is only its input again (the form labels a typed code with it, maybe cut with "…"). */
export const labelRepeatsInput = (r: Pick<RunDetail, 'label' | 'source' | 'diagram'>): boolean =>
  (r.source ?? `PD ${pdToText(r.diagram.pd)}`).startsWith(r.label.replace(/…$/, ''));
