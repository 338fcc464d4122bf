// Device side of S16, S17: what the device shows for a record is its last server snapshot with
// its own pending writes on top, and a pulled snapshot replaces the base only when newer.
import type { Fields, Mutation, PulledChange, PullViewer, SyncRecord } from '@/shared/api/sync';
import { byClock } from './outbox';
import { policies } from './policy';

export interface LocalRecord {
  id: string;
  type: SyncRecord['type'];
  /** Last server snapshot stored (null: never pulled, made on this device). */
  base: SyncRecord | null;
  /** What the device shows: base + pending mutations (S17). */
  fields: Fields;
}

export function rebase(baseFields: Fields, pending: readonly Mutation[]): Fields {
  return [...pending].sort(byClock).reduce<Fields>((acc, m) => ({ ...acc, ...m.fields }), { ...baseFields });
}

export type PullEffect = { kind: 'keep' } | { kind: 'put'; record: LocalRecord } | { kind: 'drop'; id: string };

/** `pending`: this record's mutations still in the outbox. */
export function applyPulled(
  local: LocalRecord | undefined,
  change: PulledChange,
  pending: readonly Mutation[],
): PullEffect {
  if ('revoked' in change) return local ? { kind: 'drop', id: change.revoked.id } : { kind: 'keep' }; // S22
  const incoming = change.record;
  if (local?.base && local.base.version >= incoming.version) return { kind: 'keep' }; // S16
  const mine = pending.filter((m) => m.recordId === incoming.id);
  return {
    kind: 'put',
    record: { id: incoming.id, type: incoming.type, base: incoming, fields: rebase(incoming.fields, mine) },
  };
}

/** A record made on this device before any pull: defaults + its pending writes (S13, S17). */
export function localOnly(id: string, type: SyncRecord['type'], pending: readonly Mutation[], now: string): LocalRecord {
  return { id, type, base: null, fields: rebase(policies[type].defaults(now), pending) };
}

/**
 * S22a: when the user's groups changed since the last pull, the device drops what it may no
 * longer see (unless it has its own pending writes there) and pulls again from 0.
 */
export const sameViewer = (a: PullViewer, b: PullViewer): boolean =>
  a.userId === b.userId && a.groupIds.length === b.groupIds.length && a.groupIds.every((g, i) => g === b.groupIds[i]);

export function outOfScope(r: LocalRecord, v: PullViewer, pending: readonly Mutation[]): boolean {
  if (!r.base || r.base.ownerId === v.userId || pending.some((m) => m.recordId === r.id)) return false;
  const groupId = r.base.fields.groupId;
  return !(typeof groupId === 'string' && v.groupIds.includes(groupId));
}
