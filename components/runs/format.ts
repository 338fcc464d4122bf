// Small words and numbers the run screens share.
import { formatDuration } from '@/shared/text/duration';
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
  return formatDuration((r.finishedAt ? Date.parse(r.finishedAt) : now) - Date.parse(r.startedAt));
}

export const ringLabel = (r: Pick<RunSummary, 'ring' | 'reduced'>) => `${r.ring}${r.reduced ? ', reduced' : ''}`;
