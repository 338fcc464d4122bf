// Storage of synced records, the changes log and applied mutation ids. Every record type is
// read and written as the protocol's StoredState (fields + per-field writers + version) and
// its scope (owner, group), whatever its table looks like.
import type { DataSource, EntityManager, ObjectLiteral, SelectQueryBuilder } from 'typeorm';

import type { Role } from '@/shared/api/groups';
import { sketchFieldNames, type SketchFields } from '@/shared/api/sketches';
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

/** Insert or update in one statement: TypeORM's save() would read the row back and deep-merge it. */
export async function saveRecord(db: Db, type: RecordType, id: string, ownerId: string, state: StoredState): Promise<void> {
  const { fields, version, writers } = state;
  const [entity, row, columns] =
    type === 'sketch'
      ? [Sketch, { id, ownerId, ...(fields as SketchFields), version, writers }, [...sketchFieldNames, 'version', 'writers']]
      : [SyncConflict, { id, ownerId, fields: fields as ConflictFields, version, writers }, ['fields', 'version', 'writers']];
  await db.createQueryBuilder().insert().into(entity).values(row as object).orUpdate(columns, ['id']).execute();
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
    superseded: false,
  };
  // S15a: older changes of this record that moved no scope are no longer worth pulling.
  await db
    .getRepository(SyncChange)
    .createQueryBuilder()
    .update()
    .set({ superseded: true })
    .where('recordType = :t AND recordId = :id AND prevGroupId IS NULL AND superseded = :no', { t: record.type, id: record.id, no: false })
    .execute();
  // TypeORM's deep-partial type cannot map the snapshot's unknown-valued fields; the row is whole.
  await db.getRepository(SyncChange).insert(row as object);
}

/** S22 as SQL: rows of `alias` owned by the viewer or whose `groupColumns` name one of their groups. */
export function whereVisible<T extends ObjectLiteral>(qb: SelectQueryBuilder<T>, alias: string, v: Viewer, groupColumns = ['groupId']) {
  const groups = [...v.groups.keys()];
  const inGroup = groups.length ? groupColumns.map((c) => ` OR ${alias}.${c} IN (:...groups)`).join('') : '';
  return qb.andWhere(`(${alias}.ownerId = :me${inGroup})`, { me: v.userId, groups });
}

const visibleChanges = (db: Db, v: Viewer, after: number, upTo: number) =>
  whereVisible(
    db
      .getRepository(SyncChange)
      .createQueryBuilder('c')
      .where('c.seq > :after AND c.seq <= :upTo AND c.superseded = :no', { after, upTo, no: false }),
    'c',
    v,
    ['groupId', 'prevGroupId'],
  ).orderBy('c.seq', 'ASC');

/** Seq and snapshot size of the changes after `cursor` up to `head` the viewer may see, at most `take` (S15, S22). */
export async function changeSizes(db: Db, v: Viewer, cursor: number, head: number, take: number) {
  const rows = await visibleChanges(db, v, cursor, head).select('c.seq', 'seq').addSelect('LENGTH(c.snapshot)', 'bytes').limit(take).getRawMany<{ seq: number; bytes: number }>();
  return rows.map((r) => ({ seq: Number(r.seq), bytes: Number(r.bytes) }));
}

/** The whole visible changes in (after, upTo]. */
export const changesBetween = (db: Db, v: Viewer, after: number, upTo: number) => visibleChanges(db, v, after, upTo).getMany();

export const findApplied = (db: Db, mutationId: string) => db.getRepository(SyncMutation).findOneBy({ mutationId });

export async function recordApplied(db: Db, userId: string, deviceId: string, result: PushResult): Promise<void> {
  await db.getRepository(SyncMutation).insert({ mutationId: result.mutationId, userId, deviceId, result });
}

