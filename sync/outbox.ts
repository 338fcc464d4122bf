// Device side of S5-S8: turn a local write into a mutation and settle the outbox on an answer.
import type { Fields, Mutation, Op, PushResult, RecordType } from '@/shared/api/sync';

export interface WriteIntent {
  recordId: string;
  type: RecordType;
  op: Op;
  fields: Fields;
  /** Version of the record's server snapshot this device has (0: none yet). */
  baseVersion: number;
}

/** S5: add/update also assert `deleted: false`; delete carries `deleted: true`. */
export function mutationFor(intent: WriteIntent, deviceId: string, clock: number, mutationId: string): Mutation {
  const fields = { ...intent.fields, deleted: intent.op === 'delete' };
  return { mutationId, deviceId, clock, recordId: intent.recordId, type: intent.type, op: intent.op, baseVersion: intent.baseVersion, fields };
}

export interface Rejected {
  mutation: Mutation;
  reason: string;
}

/** S8: acknowledged mutations leave the outbox; rejected ones move aside; unanswered stay. */
export function settle(outbox: readonly Mutation[], results: readonly PushResult[]): { done: string[]; rejected: Rejected[] } {
  const byId = new Map(results.map((r) => [r.mutationId, r]));
  const done: string[] = [];
  const rejected: Rejected[] = [];
  for (const m of outbox) {
    const r = byId.get(m.mutationId);
    if (!r) continue;
    if (r.status === 'rejected') rejected.push({ mutation: m, reason: r.reason ?? 'rejected' });
    else done.push(m.mutationId);
  }
  return { done, rejected };
}

/**
 * S8a: a write that follows an unsent write of the same record joins it (one mutation, the
 * later values winning, the later clock), so a drawing session does not queue one whole
 * diagram per stroke. Null when `last` was already handed out for sending, or is another record.
 */
export function coalesce(last: Mutation | undefined, next: Mutation, sentUpTo: number): Mutation | null {
  if (!last || last.clock <= sentUpTo || last.recordId !== next.recordId || last.type !== next.type) return null;
  const op = last.op === 'add' ? 'add' : next.op;
  return { ...last, clock: next.clock, op, fields: { ...last.fields, ...next.fields } };
}

/** S8: the order mutations are sent in. */
export const byClock = (a: Mutation, b: Mutation): number => a.clock - b.clock;
