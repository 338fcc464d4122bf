import type { DataSource, EntityManager } from 'typeorm';
import { In, IsNull, Not } from 'typeorm';
import { Comment, Photo, Sketch, SketchFork, SketchInvariant, User } from '../db/entities';
import { inTransaction } from '../db/transaction';
import { hasResultsSql } from './runs';

type Db = DataSource | EntityManager;

export interface FeedFilter {
  groupId: string;
  /** Sketch versions below this one (the paging key: a sketch's version is a unique server seq). */
  before?: number;
  /** In normal form (shared/api/tags.ts); stored tags typed before it are compared lower-cased. */
  tag?: string;
  ownerId?: string;
  hasResults?: boolean;
  take: number;
}

export async function feedSketches(db: Db, f: FeedFilter): Promise<Sketch[]> {
  const qb = db.getRepository(Sketch).createQueryBuilder('s').where('s.groupId = :g AND s.deleted = :no', { g: f.groupId, no: false });
  if (f.before) qb.andWhere('s.version < :before', { before: f.before });
  if (f.ownerId) qb.andWhere('s.ownerId = :owner', { owner: f.ownerId });
  if (f.tag) qb.andWhere('EXISTS (SELECT 1 FROM json_each(s.tags) t WHERE lower(t.value) = :tag)', { tag: f.tag });
  if (f.hasResults !== undefined) {
    const sql = hasResultsSql('s.id');
    qb.andWhere(f.hasResults ? sql : `NOT ${sql}`);
  }
  return qb.orderBy('s.version', 'DESC').limit(f.take).getMany();
}

export async function usersById(db: Db, ids: string[]): Promise<Map<string, User>> {
  const rows = ids.length ? await db.getRepository(User).findBy({ id: In([...new Set(ids)]) }) : [];
  return new Map(rows.map((u) => [u.id, u]));
}

/** Comments per sketch, counting only those written in `groupId` (where the sketch is shared now). */
export async function commentCounts(db: Db, groupId: string, sketchIds: string[]): Promise<Map<string, number>> {
  if (sketchIds.length === 0) return new Map();
  const rows: { sketchId: string; n: number }[] = await db
    .getRepository(Comment)
    .createQueryBuilder('c')
    .select('c.sketchId', 'sketchId')
    .addSelect('COUNT(*)', 'n')
    .where('c.groupId = :g AND c.sketchId IN (:...ids)', { g: groupId, ids: sketchIds })
    .groupBy('c.sketchId')
    .getRawMany();
  return new Map(rows.map((r) => [r.sketchId, Number(r.n)]));
}

/** The first photo of each sketch (oldest first). */
export async function firstPhotos(db: Db, sketchIds: string[]): Promise<Map<string, Photo>> {
  const rows = sketchIds.length ? await db.getRepository(Photo).find({ where: { sketchId: In(sketchIds) }, order: { createdAt: 'DESC' } }) : [];
  return new Map(rows.map((p) => [p.sketchId, p])); // later rows (older photos) win
}

/** The stored summaries of these sketches, whatever version they are of. */
export async function storedSummaries(db: Db, ids: readonly string[]): Promise<Map<string, SketchInvariant>> {
  const rows = ids.length ? await db.getRepository(SketchInvariant).findBy({ sketchId: In([...ids]) }) : [];
  return new Map(rows.map((r) => [r.sketchId, r]));
}

/** The summary of each sketch at its current version; `stale` are those without one yet. */
export async function currentSummaries(db: Db, rows: Pick<Sketch, 'id' | 'version'>[]): Promise<{ current: Map<string, SketchInvariant>; stale: string[] }> {
  const stored = await storedSummaries(db, rows.map((r) => r.id));
  const current = new Map(rows.filter((r) => stored.get(r.id)?.version === r.version).map((r) => [r.id, stored.get(r.id)!]));
  return { current, stale: rows.filter((r) => !current.has(r.id)).map((r) => r.id) };
}

/** Live shared sketches among `ids`, with what a summary needs (the feed shows no others). */
export const sharedDiagrams = (db: Db, ids: readonly string[]) =>
  ids.length
    ? db.getRepository(Sketch).find({ where: { id: In([...ids]), groupId: Not(IsNull()), deleted: false }, select: { id: true, version: true, diagram: true } })
    : Promise.resolve([]);

/** Live shared sketches with no summary of their current version. */
export async function sketchesWithoutSummary(db: Db): Promise<string[]> {
  const rows: { id: string }[] = await db
    .getRepository(Sketch)
    .createQueryBuilder('s')
    .select('s.id', 'id')
    .leftJoin(SketchInvariant, 'i', 'i.sketchId = s.id')
    .where('s.groupId IS NOT NULL AND s.deleted = :no AND (i.version IS NULL OR i.version != s.version)', { no: false })
    .getRawMany();
  return rows.map((r) => r.id);
}

/** The summary is of the same diagram at a newer version. */
export const moveSummary = (db: DataSource, sketchId: string, version: number) =>
  inTransaction(db, (m) => m.getRepository(SketchInvariant).update({ sketchId }, { version }));

export const saveSummary = (db: DataSource, row: SketchInvariant) =>
  inTransaction(db, (m) => m.getRepository(SketchInvariant).upsert(row, ['sketchId']));

/** Live sketches of a group (id and version only). */
export const groupSketchVersions = (db: Db, groupId: string) =>
  db.getRepository(Sketch).find({ where: { groupId, deleted: false }, select: { id: true, version: true, title: true, ownerId: true } });

export const findFork = (db: Db, sketchId: string) => db.getRepository(SketchFork).findOneBy({ sketchId });

export async function insertFork(db: Db, row: SketchFork): Promise<void> {
  await db.getRepository(SketchFork).insert(row);
}
