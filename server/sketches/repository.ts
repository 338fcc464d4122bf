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

/** Whether a sketch the viewer may see lists this attachment hash (S27). */
export async function seesAttachment(db: Db, v: Viewer, sha256: string): Promise<boolean> {
  const qb = db.getRepository(Sketch).createQueryBuilder('s').where('s.attachments LIKE :h', { h: `%"${sha256}"%` });
  return (await whereVisible(qb, 's', v).getCount()) > 0;
}
