// S22, S23: who may see and who may write a record. Pure predicates over the user's groups.
import type { Role } from '@/shared/api/groups';

export interface Viewer {
  userId: string;
  /** groupId -> the user's role there. */
  groups: ReadonlyMap<string, Role>;
}

export interface Scope {
  ownerId: string;
  groupId: string | null;
}

export const canSee = (v: Viewer, s: Scope): boolean =>
  s.ownerId === v.userId || (s.groupId !== null && v.groups.has(s.groupId));

/**
 * `existing`: the stored record's scope (null: new record). `groupId`: the group the write
 * would share it to (undefined: unchanged). Same answer for unknown and forbidden (S24).
 */
export function canWrite(v: Viewer, existing: Scope | null, groupId: string | null | undefined): boolean {
  if (existing && existing.ownerId !== v.userId) return false;
  // The group it is shared to after the write: the owner must still post there, so someone
  // removed from the group (or made a viewer) no longer writes into it; taking it out is fine.
  const group = groupId === undefined ? (existing?.groupId ?? null) : groupId;
  if (group === null) return true;
  const role = v.groups.get(group);
  return role !== undefined && role !== 'viewer';
}
