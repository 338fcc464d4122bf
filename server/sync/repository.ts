// Storage of synced records, the changes log and applied mutation ids. Every record type is
// read and written as the protocol's StoredState (fields + per-field writers + version) and
// its scope (owner, group), whatever its table looks like.
import type { DataSource, EntityManager, ObjectLiteral, SelectQueryBuilder } from 'typeorm';

import type { Role } from '@/shared/api/groups';
import type { SketchFields } from '@/shared/api/sketches';
import type { ConflictFields, PushResult, RecordType, SyncRecord } from '@/shared/api/sync';
import type { StoredState } from '@/sync/merge';
import type { Scope, Viewer } from '@/sync/scope';
import { Membership, Sketch, SyncChange, SyncConflict, SyncMutation } from '../db/entities';

type Db = DataSource | EntityManager;

export interface StoredRecord {
  state: StoredState;
  scope: Scope;
}

export async function viewerOf(db: Db, userId: string): Promise<Viewer> {
  const rows = await db.getRepository(Membership).find({ where: { userId }, select: { groupId: true, role: true } });
  return { userId, groups: new Map<string, Role>(rows.map((r) => [r.groupId, r.role])) };
}

export function sketchFieldsOf(s: Sketch): SketchFields {
  const { title, seenAt, notes, tags, diagram, attachments, createdAt, updatedAt, groupId, deleted } = s;
  return { title, seenAt, notes, tags, diagram, attachments, createdAt, updatedAt, groupId, deleted };
}

export async function loadRecord(db: Db, type: RecordType, id: string): Promise<StoredRecord | null> {
  if (type === 'sketch') {
    const s = await db.getRepository(Sketch).findOneBy({ id });
    return s && { state: { fields: sketchFieldsOf(s), writers: s.writers, version: s.version }, scope: { ownerId: s.ownerId, groupId: s.groupId } };
  }
  const c = await db.getRepository(SyncConflict).findOneBy({ id });
  return c && { state: { fields: c.fields, writers: c.writers, version: c.version }, scope: { ownerId: c.ownerId, groupId: null } };
}

export async function saveRecord(db: Db, type: RecordType, id: string, ownerId: string, state: StoredState): Promise<void> {
  if (type === 'sketch') {
    const fields = state.fields as SketchFields;
    await db.getRepository(Sketch).save({ id, ownerId, ...fields, version: state.version, writers: state.writers });
  } else {
    await db.getRepository(SyncConflict).save({ id, ownerId, fields: state.fields as ConflictFields, version: state.version, writers: state.writers });
  }
}

export const snapshotOf = (type: RecordType, id: string, ownerId: string, state: StoredState): SyncRecord => ({
  id,
  type,
  version: state.version,
  ownerId,
  fields: state.fields,
});

/** The largest seq in the log (0 when empty). Called inside the writing transaction (S9). */
export async function headSeq(db: Db): Promise<number> {
  const row = await db.getRepository(SyncChange).createQueryBuilder('c').select('MAX(c.seq)', 'head').getRawOne<{ head: number | null }>();
  return row?.head ?? 0;
}

export async function appendChange(db: Db, seq: number, record: SyncRecord, groupId: string | null, prevGroupId: string | null) {
  const row: SyncChange = {
    seq,
    recordType: record.type,
    recordId: record.id,
    ownerId: record.ownerId,
    groupId,
    prevGroupId: prevGroupId === groupId ? null : prevGroupId,
    snapshot: record,
  };
  // TypeORM's deep-partial type cannot map the snapshot's unknown-valued fields; the row is whole.
  await db.getRepository(SyncChange).insert(row as object);
}

/** S22 as SQL: rows of `alias` owned by the viewer or whose `groupColumns` name one of their groups. */
export function whereVisible<T extends ObjectLiteral>(qb: SelectQueryBuilder<T>, alias: string, v: Viewer, groupColumns = ['groupId']) {
  const groups = [...v.groups.keys()];
  const inGroup = groups.length ? groupColumns.map((c) => ` OR ${alias}.${c} IN (:...groups)`).join('') : '';
  return qb.andWhere(`(${alias}.ownerId = :me${inGroup})`, { me: v.userId, groups });
}

/** Changes after `cursor` up to `head` that concern the viewer (S15, S22), at most `take`. */
export function changesFor(db: Db, v: Viewer, cursor: number, head: number, take: number): Promise<SyncChange[]> {
  const qb = db.getRepository(SyncChange).createQueryBuilder('c').where('c.seq > :cursor AND c.seq <= :head', { cursor, head });
  return whereVisible(qb, 'c', v, ['groupId', 'prevGroupId']).orderBy('c.seq', 'ASC').limit(take).getMany();
}

export const findApplied = (db: Db, mutationId: string) => db.getRepository(SyncMutation).findOneBy({ mutationId });

export async function recordApplied(db: Db, userId: string, deviceId: string, result: PushResult): Promise<void> {
  await db.getRepository(SyncMutation).insert({ mutationId: result.mutationId, userId, deviceId, result });
}

