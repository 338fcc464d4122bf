import type { DataSource, EntityManager } from 'typeorm';
import type { Viewer } from '@/sync/scope';
import { Sketch } from '../db/entities';
import { whereVisible } from '../sync/repository';

type Db = DataSource | EntityManager;

/** The sketches a viewer may see (sync/SPEC.md S22), newest change first. */
export function visibleSketches(db: Db, v: Viewer, opts: { groupId?: string; includeDeleted: boolean }) {
  const qb = whereVisible(db.getRepository(Sketch).createQueryBuilder('s'), 's', v);
  if (opts.groupId) qb.andWhere('s.groupId = :g', { g: opts.groupId });
  if (!opts.includeDeleted) qb.andWhere('s.deleted = :no', { no: false });
  return qb.orderBy('s.version', 'DESC').getMany();
}

export const findSketch = (db: Db, id: string) => db.getRepository(Sketch).findOneBy({ id });

/**
 * Whether a sketch the viewer may see lists this attachment hash and is owned by someone who
 * uploaded those bytes (S27): listing a hash one only knows shares nothing.
 */
export async function seesAttachment(db: Db, v: Viewer, sha256: string): Promise<boolean> {
  const qb = db
    .getRepository(Sketch)
    .createQueryBuilder('s')
    .where('s.attachments LIKE :h', { h: `%"${sha256}"%` })
    .andWhere('EXISTS (SELECT 1 FROM attachment_uploaders u WHERE u.sha256 = :sha AND u.userId = s.ownerId)', { sha: sha256 });
  return (await whereVisible(qb, 's', v).getCount()) > 0;
}
