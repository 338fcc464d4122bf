// Small words and numbers the run screens share.
import type { RunStatus, RunSummary } from '@/shared/api/runs';

export const statusLabel: Record<RunStatus, string> = {
  queued: 'Queued',
  running: 'Running',
  done: 'Done',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

export function duration(r: Pick<RunSummary, 'startedAt' | 'finishedAt'>, now = Date.now()): string {
  if (!r.startedAt) return '–';
  const ms = (r.finishedAt ? Date.parse(r.finishedAt) : now) - Date.parse(r.startedAt);
  if (ms < 1000) return `${ms} ms`;
  if (ms < 120_000) return `${(ms / 1000).toFixed(1)} s`;
  return `${Math.round(ms / 60_000)} min`;
}

export const ringLabel = (r: Pick<RunSummary, 'ring' | 'reduced'>) => `${r.ring}${r.reduced ? ', reduced' : ''}`;
