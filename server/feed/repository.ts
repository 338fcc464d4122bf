import type { DataSource, EntityManager } from 'typeorm';
import { In } from 'typeorm';
import { Comment, Photo, Sketch, SketchFork, SketchInvariant, User } from '../db/entities';
import { inTransaction } from '../db/transaction';
import { hasResultsSql } from './runs';
import { summarise } from './invariants';

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

/**
 * The Readout summary of each sketch at its current version, computed once per version and
 * kept in sketch_invariants. `rows` need id and version; diagrams are loaded only when stale.
 */
export async function invariantsOf(db: DataSource, rows: Pick<Sketch, 'id' | 'version'>[]): Promise<Map<string, SketchInvariant>> {
  const ids = rows.map((r) => r.id);
  const cached = ids.length ? await db.getRepository(SketchInvariant).findBy({ sketchId: In(ids) }) : [];
  const out = new Map(cached.map((c) => [c.sketchId, c]));
  const stale = rows.filter((r) => out.get(r.id)?.version !== r.version).map((r) => r.id);
  if (stale.length === 0) return out;
  const sketches = await db.getRepository(Sketch).find({ where: { id: In(stale) }, select: { id: true, version: true, diagram: true } });
  const fresh = sketches.map((s): SketchInvariant => ({ sketchId: s.id, version: s.version, ...summarise(s.diagram) }));
  await inTransaction(db, (m) => m.getRepository(SketchInvariant).upsert(fresh, ['sketchId']));
  for (const f of fresh) out.set(f.sketchId, f);
  return out;
}

/** Live sketches of a group (id and version only). */
export const groupSketchVersions = (db: Db, groupId: string) =>
  db.getRepository(Sketch).find({ where: { groupId, deleted: false }, select: { id: true, version: true, title: true, ownerId: true } });

export const findFork = (db: Db, sketchId: string) => db.getRepository(SketchFork).findOneBy({ sketchId });

export async function insertFork(db: Db, row: SketchFork): Promise<void> {
  await db.getRepository(SketchFork).insert(row);
}
